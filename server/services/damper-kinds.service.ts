/**
 * The shop's list of damping adjuster kinds: read by everyone signed in, added to by the admin
 * (each addition audited in its own transaction). Bikes and bike models name only kinds on it.
 */
import { EntityManager, In } from 'typeorm';
import type { BikeSpec } from '../../shared/types/bike';
import type { DamperKind as DamperKindView } from '../../shared/types/damping';
import type { AppContext } from '../app-context';
import { DamperKind } from '../entities/damper-kind.entity';
import { ConflictError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { recordAudit } from './audit.service';

/** In the order they were added: the six of the trade first, as their migration lists them. */
const LIST_SQL = `SELECT "key", "label", "circuit", "speed" FROM "damper_kind" ORDER BY rowid`;

function toDamperKindView(kind: DamperKindView): DamperKindView {
  return { key: kind.key, label: kind.label, circuit: kind.circuit, speed: kind.speed };
}

/** Refuses, by field, an adjuster whose kind is not on the list (`front.dampers[1].kind`). */
export async function assertKnownDamperKinds(manager: EntityManager, spec: Pick<BikeSpec, 'front' | 'rear'>): Promise<void> {
  const named = (['front', 'rear'] as const).flatMap((end) => (spec[end]?.dampers ?? []).map((damper, index) => ({ path: `${end}.dampers[${index}].kind`, kind: damper.kind })));
  if (named.length === 0) return;
  const rows = await manager.find(DamperKind, { select: { key: true }, where: { key: In([...new Set(named.map((n) => n.kind))]) } });
  const known = new Set(rows.map((row) => row.key));
  const unknown = named.filter((n) => !known.has(n.kind));
  if (unknown.length > 0) {
    throw new ValidationError(Object.fromEntries(unknown.map((n) => [n.path, `${n.kind} is not on the shop’s list of adjuster kinds: choose one from the list, or ask the shop to add it.`])));
  }
}

export class DamperKindsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  async list(): Promise<DamperKindView[]> {
    const rows: DamperKindView[] = await this.ctx.db.read.query(LIST_SQL);
    return rows.map(toDamperKindView);
  }

  create(actor: AuthUser, input: DamperKindView): Promise<DamperKindView> {
    return this.ctx.db.write(async (manager) => {
      if (await manager.existsBy(DamperKind, { key: input.key })) {
        throw new ConflictError('An adjuster kind with this key exists already.', 'damper-kind-taken', { key: 'An adjuster kind with this key exists already.' });
      }
      const now = this.ctx.now();
      const view = toDamperKindView(input);
      await manager.insert(DamperKind, { ...view, createdAt: now });
      await recordAudit(manager, actor, now, { entity: 'damper-kind', entityKey: view.key, action: 'create', before: null, after: view });
      return view;
    });
  }
}
