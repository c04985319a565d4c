/** The shop's catalogue of bike models: read by everyone signed in, written by the admin, every write audited. */
import { EntityManager } from 'typeorm';
import type { BikeModel as BikeModelView, BikeSpec } from '../../shared/types/bike';
import type { AppContext } from '../app-context';
import { BikeModel } from '../entities/bike-model.entity';
import { ConflictError, NotFoundError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { recordAudit } from './audit.service';
import { assertKnownDamperKinds } from './damper-kinds.service';

export interface BikeModelInput extends BikeSpec {
  name: string;
  description: string;
}

export function toBikeModelView(row: BikeModel): BikeModelView {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    masses: row.masses,
    front: row.front,
    rear: row.rear,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function assertNameFree(manager: EntityManager, name: string, exceptId?: number): Promise<void> {
  const clash = await manager
    .getRepository(BikeModel)
    .createQueryBuilder('m')
    .where('m.name = :name COLLATE NOCASE', { name })
    .getOne();
  if (clash && clash.id !== exceptId) {
    throw new ConflictError('A bike model with this name exists already.', 'name-taken', { name: 'A bike model with this name exists already.' });
  }
}

export class BikeModelsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  async list(): Promise<BikeModelView[]> {
    const rows = await this.ctx.db.read.getRepository(BikeModel).find({ order: { name: 'ASC', id: 'ASC' } });
    return rows.map(toBikeModelView);
  }

  async get(id: number): Promise<BikeModelView> {
    const row = await this.ctx.db.read.getRepository(BikeModel).findOneBy({ id });
    if (!row) throw new NotFoundError('There is no such bike model.');
    return toBikeModelView(row);
  }

  create(actor: AuthUser, input: BikeModelInput): Promise<BikeModelView> {
    return this.ctx.db.write(async (manager) => {
      await assertNameFree(manager, input.name);
      await assertKnownDamperKinds(manager, input);
      const now = this.ctx.now();
      const row = await manager.save(manager.create(BikeModel, { ...input, createdAt: now, updatedAt: now }));
      const view = toBikeModelView(row);
      await recordAudit(manager, actor, now, { entity: 'bike-model', entityKey: String(row.id), action: 'create', before: null, after: view });
      return view;
    });
  }

  update(actor: AuthUser, id: number, input: BikeModelInput): Promise<BikeModelView> {
    return this.ctx.db.write(async (manager) => {
      const row = await manager.findOneBy(BikeModel, { id });
      if (!row) throw new NotFoundError('There is no such bike model.');
      await assertNameFree(manager, input.name, id);
      await assertKnownDamperKinds(manager, input);
      const before = toBikeModelView(row);
      const now = this.ctx.now();
      const saved = await manager.save(BikeModel, { ...row, ...input, updatedAt: now });
      const after = toBikeModelView(saved);
      await recordAudit(manager, actor, now, { entity: 'bike-model', entityKey: String(id), action: 'update', before, after });
      return after;
    });
  }

  /** The bikes made from it keep their copied values; their link to it is cleared. */
  delete(actor: AuthUser, id: number): Promise<void> {
    return this.ctx.db.write(async (manager) => {
      const row = await manager.findOneBy(BikeModel, { id });
      if (!row) throw new NotFoundError('There is no such bike model.');
      await manager.delete(BikeModel, { id });
      await recordAudit(manager, actor, this.ctx.now(), { entity: 'bike-model', entityKey: String(id), action: 'delete', before: toBikeModelView(row), after: null });
    });
  }
}
