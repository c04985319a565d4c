/** The audit of shop data edits: one row per write, made inside that write's transaction. */
import { EntityManager } from 'typeorm';
import type { AuditEntity } from '../../shared/schemas/shop-data.schema';
import type { AuditAction, AuditEntry as AuditEntryView, AuditPage } from '../../shared/types/shop-data';
import type { AppContext } from '../app-context';
import { AuditEntry } from '../entities/audit-entry.entity';
import type { AuthUser } from '../types/auth-user';

export interface AuditRecord {
  entity: AuditEntity;
  entityKey: string;
  action: AuditAction;
  /** The stored row as the API shows it; null before a create and after a delete. */
  before: object | null;
  after: object | null;
}

export async function recordAudit(manager: EntityManager, actor: Pick<AuthUser, 'id' | 'name'>, at: Date, record: AuditRecord): Promise<void> {
  await manager.insert(AuditEntry, {
    at,
    actorId: actor.id,
    actorName: actor.name,
    entity: record.entity,
    entityKey: record.entityKey,
    action: record.action,
    before: record.before,
    after: record.after,
  });
}

function toAuditView(row: AuditEntry): AuditEntryView {
  return {
    id: row.id,
    at: row.at.toISOString(),
    actorId: row.actorId,
    actorName: row.actorName,
    entity: row.entity,
    entityKey: row.entityKey,
    action: row.action,
    before: row.before,
    after: row.after,
  };
}

export class AuditService {
  constructor(private readonly ctx: Pick<AppContext, 'db'>) {}

  /** Newest first. */
  async list(query: { entity?: AuditEntity; page: number; pageSize: number }): Promise<AuditPage> {
    const [rows, total] = await this.ctx.db.read.getRepository(AuditEntry).findAndCount({
      where: query.entity ? { entity: query.entity } : {},
      order: { id: 'DESC' },
      skip: (query.page - 1) * query.pageSize,
      take: query.pageSize,
    });
    return { entries: rows.map(toAuditView), total, page: query.page, pageSize: query.pageSize };
  }
}
