/**
 * Per end, the damping adjusters back to the maker's standard or back to the rider's baseline (the
 * settings before the setup log's first entry), as plans of turns; and either plan put on the bike
 * as one setup-log entry. Adjusters the target does not name are left as they are and listed.
 */
import { EntityManager } from 'typeorm';
import { planToBaseline, planToStandard } from '../../shared/damping/plans';
import type { DamperKind as DamperKindView, DamperPlan } from '../../shared/types/damping';
import type { SetupSettings } from '../../shared/types/setup-log';
import type { EndKind } from '../../shared/types/sizing';
import type { DamperPlanApplied, DamperPlans, DamperPlanTarget, EndDamperPlans } from '../../shared/types/test-ride';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { SetupLogEntry } from '../entities/setup-log-entry.entity';
import { ConflictError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { findOwnedBike } from './bikes.service';
import { DamperKindsService } from './damper-kinds.service';
import { SetupLogService, writeSetupChange } from './setup-log.service';


const NOTES: Record<DamperPlanTarget, string> = { standard: "Back to the maker's standard", baseline: 'Back to the baseline' };

const TARGET_WORDS: Record<DamperPlanTarget, string> = { standard: "the maker's standard", baseline: 'the baseline' };

/** The settings before the first entry; null while the log is empty. */
async function baselineOf(manager: EntityManager, bikeId: number): Promise<{ settings: SetupSettings; at: Date } | null> {
  const first = await manager.findOne(SetupLogEntry, { select: { id: true, before: true, createdAt: true }, where: { bikeId }, order: { id: 'ASC' } });
  return first ? { settings: first.before, at: first.createdAt } : null;
}

/** With an empty log nothing has been changed since the bike was entered, so its settings now are the baseline. */
function baselineDampers(bike: Bike, end: EndKind, baseline: SetupSettings | null): Record<string, number> {
  if (baseline) return baseline[end]?.dampers ?? {};
  return Object.fromEntries((bike[end]?.dampers ?? []).map((damper) => [damper.kind, damper.position]));
}

function plansOf(bike: Bike, end: EndKind, baseline: SetupSettings | null, kinds: readonly DamperKindView[]): EndDamperPlans | null {
  const dampers = bike[end]?.dampers ?? [];
  if (dampers.length === 0) return null;
  return { standard: planToStandard(end, dampers, kinds), baseline: planToBaseline(end, dampers, baselineDampers(bike, end, baseline), kinds) };
}

export class DamperPlansService {
  private readonly log: SetupLogService;
  private readonly kinds: DamperKindsService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {
    this.log = new SetupLogService(ctx);
    this.kinds = new DamperKindsService(ctx);
  }

  async plans(user: AuthUser, bikeId: number): Promise<DamperPlans> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const [baseline, kinds] = await Promise.all([baselineOf(read, bikeId), this.kinds.list()]);
    const settings = baseline?.settings ?? null;
    return {
      front: plansOf(bike, 'front', settings, kinds),
      rear: plansOf(bike, 'rear', settings, kinds),
      baselineText: baseline
        ? `The baseline is the settings before the first setup-log entry (${baseline.at.toISOString().slice(0, 10)}).`
        : 'The setup log is empty, so the settings now are the baseline.',
    };
  }

  /** One end's plan followed on the bike, as one log entry; refused when it has nothing to set. */
  async apply(user: AuthUser, bikeId: number, target: DamperPlanTarget, end: EndKind): Promise<DamperPlanApplied> {
    const kinds = await this.kinds.list();
    const { plan, entryId } = await this.ctx.db.write(async (manager) => {
      const bike = await findOwnedBike(manager, user, bikeId);
      const baseline = target === 'baseline' ? ((await baselineOf(manager, bikeId))?.settings ?? null) : null;
      const plans = plansOf(bike, end, baseline, kinds);
      if (!plans) throw new ValidationError({ end: `This bike has no damping adjusters at the ${end}.` });
      const plan: DamperPlan = plans[target];
      if (plan.steps.length === 0) {
        const why = plan.atTarget ? `Every adjuster at the ${end} is at ${TARGET_WORDS[target]} already.` : `No adjuster at the ${end} can be set to ${TARGET_WORDS[target]}: ${plan.missing.join(' ')}`;
        throw new ConflictError(`${why} Nothing to do.`, plan.atTarget ? 'at-target' : 'no-target');
      }
      const dampers = Object.fromEntries(plan.steps.map((step) => [step.adjuster, step.to]));
      const entryId = await writeSetupChange(manager, user, bike, { note: `${NOTES[target]} (${end} damping)`, [end]: { dampers } }, this.ctx.now());
      return { plan, entryId };
    });
    return { target, plan, ...(await this.log.answer(user, bikeId, entryId)) };
  }
}
