/**
 * The symptom-to-change table: read by the desk and the admin, added to by both (a row added is
 * the shop's own, source 'shop'), edited by the admin. Every write is audited in its transaction.
 * The loop reads the active rows (`activeRules`) whatever the caller.
 */
import { EntityManager, Not } from 'typeorm';
import { damperLabel, symptomOf } from '../../shared/damping/symptoms';
import { symptomEndProblem, type DampingRuleCreateInput, type DampingRulePatchInput } from '../../shared/schemas/damping.schema';
import type { DamperKind as DamperKindView, DampingRule as DampingRuleShape, SymptomKey } from '../../shared/types/damping';
import type { EndKind } from '../../shared/types/sizing';
import type { DampingRuleView } from '../../shared/types/test-ride';
import type { AppContext } from '../app-context';
import { DamperKind } from '../entities/damper-kind.entity';
import { DampingRule } from '../entities/damping-rule.entity';
import { ConflictError, NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { recordAudit } from './audit.service';
import { DamperKindsService } from './damper-kinds.service';

/** The row as the engine reads it. */
export function toRuleShape(row: DampingRule): DampingRuleShape {
  return {
    id: row.id,
    symptom: row.symptom,
    end: row.end,
    adjuster: row.adjuster,
    direction: row.direction,
    priority: row.priority,
    why: row.why,
    feelFor: row.feelFor,
    claim: row.claim,
    source: row.source,
    active: row.active,
  };
}

function toRuleView(row: DampingRule, kinds: readonly DamperKindView[]): DampingRuleView {
  return Object.assign(toRuleShape(row), {
    symptomWords: symptomOf(row.symptom).words,
    adjusterLabel: damperLabel(row.adjuster, kinds),
    createdById: row.createdById,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  });
}

/** What the audit keeps of a row: its fields and who added it, without times (the audit row has its own). */
function toAuditShape(row: DampingRule): object {
  return { ...toRuleShape(row), createdById: row.createdById };
}

/** The active rows of one symptom and end, in the order the loop tries them. */
export async function activeRules(manager: EntityManager, symptom: SymptomKey, end: EndKind): Promise<DampingRuleShape[]> {
  const rows = await manager.find(DampingRule, { where: { symptom, end, active: true }, order: { priority: 'ASC', id: 'ASC' } });
  return rows.map(toRuleShape);
}

async function assertKnownAdjuster(manager: EntityManager, adjuster: string): Promise<void> {
  if (await manager.existsBy(DamperKind, { key: adjuster })) return;
  throw new ValidationError({ adjuster: `${adjuster} is not on the shop’s list of adjuster kinds: choose one from the list, or ask the admin to add it.` });
}

/** The loop tells tries apart by adjuster and direction, so two active rows for the same move would be one. */
async function assertNoActiveTwin(manager: EntityManager, rule: Pick<DampingRule, 'symptom' | 'end' | 'adjuster' | 'direction'>, exceptId?: number): Promise<void> {
  const twin = await manager.findOne(DampingRule, {
    select: { id: true },
    where: { symptom: rule.symptom, end: rule.end, adjuster: rule.adjuster, direction: rule.direction, active: true, ...(exceptId === undefined ? {} : { id: Not(exceptId) }) },
  });
  if (!twin) return;
  const message = `Rule ${twin.id} already turns the ${rule.end} ${rule.adjuster} ${rule.direction === 'more' ? 'in (more damping)' : 'out (less damping)'} for this symptom: edit that one, or switch it off first.`;
  throw new ConflictError(message, 'rule-exists', { adjuster: message });
}

export class DampingRulesService {
  private readonly kinds: DamperKindsService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {
    this.kinds = new DamperKindsService(ctx);
  }

  async list(): Promise<DampingRuleView[]> {
    const [rows, kinds] = await Promise.all([
      this.ctx.db.read.manager.find(DampingRule, { order: { symptom: 'ASC', end: 'ASC', priority: 'ASC', id: 'ASC' } }),
      this.kinds.list(),
    ]);
    return rows.map((row) => toRuleView(row, kinds));
  }

  /** A row of the shop's own, whoever adds it: the seeded rows alone are common practice. */
  async create(actor: AuthUser, input: DampingRuleCreateInput): Promise<DampingRuleView> {
    const row = await this.ctx.db.write(async (manager) => {
      await assertKnownAdjuster(manager, input.adjuster);
      await assertNoActiveTwin(manager, input);
      const now = this.ctx.now();
      const saved = await manager.save(
        manager.create(DampingRule, { ...input, claim: input.claim ?? null, source: 'shop', active: true, createdById: actor.id, createdAt: now, updatedAt: now }),
      );
      await recordAudit(manager, actor, now, { entity: 'damping-rule', entityKey: String(saved.id), action: 'create', before: null, after: toAuditShape(saved) });
      return saved;
    });
    return toRuleView(row, await this.kinds.list());
  }

  /** Any field, and switching a row off or on; a body that changes nothing writes nothing. */
  async update(actor: AuthUser, id: number, patch: DampingRulePatchInput): Promise<DampingRuleView> {
    const row = await this.ctx.db.write(async (manager) => {
      const stored = await manager.findOneBy(DampingRule, { id });
      if (!stored) throw new NotFoundError('There is no such rule.');
      const defined = Object.fromEntries(Object.entries(patch).filter(([, value]) => value !== undefined)) as Partial<DampingRule>;
      const next: DampingRule = { ...stored, ...defined };
      if ((Object.keys(defined) as (keyof DampingRule)[]).every((key) => defined[key] === stored[key])) return stored;
      const problem = symptomEndProblem(next.symptom, next.end);
      if (problem) throw new ValidationError({ [patch.symptom === undefined ? 'end' : 'symptom']: problem });
      if (next.adjuster !== stored.adjuster) await assertKnownAdjuster(manager, next.adjuster);
      if (next.active) await assertNoActiveTwin(manager, next, id);
      next.updatedAt = this.ctx.now();
      const saved = await manager.save(DampingRule, next);
      await recordAudit(manager, actor, next.updatedAt, { entity: 'damping-rule', entityKey: String(id), action: 'update', before: toAuditShape(stored), after: toAuditShape(saved) });
      return saved;
    });
    return toRuleView(row, await this.kinds.list());
  }
}
