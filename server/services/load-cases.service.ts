/**
 * A bike's load cases (solo, with passenger, with luggage, ...) on the spring it has fitted: the
 * settings each needs, worked out from its latest pass, and the switch from one to another, which
 * moves the preload adjusters and goes in the setup log in one transaction. Going back to solo
 * restores the solo positions exactly, since they are kept while another case is set.
 */
import { EntityManager } from 'typeorm';
import { planLoadCases } from '../../shared/garage/load-case-plan';
import { formatNumber } from '../../shared/sizing/format';
import type { ActiveLoadCase, LoadCaseOption, LoadCasesAnswer } from '../../shared/types/load-case';
import type { SetupChangeInput } from '../../shared/types/setup-log';
import type { EndKind } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { SizingRecord } from '../entities/sizing-record.entity';
import { ConflictError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { findOwnedBike } from './bikes.service';
import { SetupChangeAnswer, SetupLogService, writeSetupChange } from './setup-log.service';

const ENDS: readonly EndKind[] = ['front', 'rear'];

export class LoadCasesService {
  private readonly log: SetupLogService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {
    this.log = new SetupLogService(ctx);
  }

  async list(user: AuthUser, bikeId: number): Promise<LoadCasesAnswer> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const { record, cases } = await this.plan(read, bike);
    return { active: bike.loadCase?.name ?? null, solo: soloOf(bike), cases, recordId: record?.id ?? null };
  }

  /** Sets the bike for a case (null: solo) and logs the move. */
  async switchTo(user: AuthUser, bikeId: number, name: string | null): Promise<SetupChangeAnswer> {
    const entryId = await this.ctx.db.write(async (manager) => {
      const bike = await findOwnedBike(manager, user, bikeId);
      const current = bike.loadCase?.name ?? null;
      if (name === current) throw new ConflictError(`The bike is set for ${name ?? 'solo riding'} already: nothing changed.`, 'unchanged');
      const solo = soloOf(bike);
      const { record, cases } = await this.plan(manager, bike);
      let target: LoadCaseOption | null = null;
      if (name !== null) {
        if (!record) throw new ConflictError('Size the bike first: its load cases come from a pass with the passenger or luggage weighed in.', 'no-sizing');
        target = cases.find((c) => c.name === name) ?? null;
        if (!target) {
          const known = cases.map((c) => c.name).join(', ');
          throw new ValidationError({ name: known ? `The bike's last pass has no load case "${name}": choose ${known}, or solo.` : "The bike's last pass has no load cases: weigh in the passenger or luggage and measure again." });
        }
      }
      const change: SetupChangeInput = { note: describeSwitch(current, target) };
      for (const end of ENDS) {
        const spec = bike[end];
        if (!spec) continue;
        const position = target ? (target.ends[end]?.position ?? solo[end]) : solo[end];
        if (position !== undefined && position !== spec.adjuster.position) change[end] = { preloadPosition: position };
      }
      const loadCase: ActiveLoadCase | null = target ? { name: target.name, solo } : null;
      return writeSetupChange(manager, user, bike, change, this.ctx.now(), { loadCase });
    });
    return this.log.answer(user, bikeId, entryId);
  }

  private async plan(manager: EntityManager, bike: Bike): Promise<{ record: SizingRecord | null; cases: LoadCaseOption[] }> {
    const record = await manager.findOne(SizingRecord, { where: { bikeId: bike.id }, order: { id: 'DESC' } });
    if (!record) return { record: null, cases: [] };
    const [thresholds, forks, shocks] = await Promise.all([
      this.ctx.sizingData.warningThresholds(),
      bike.front ? this.ctx.sizingData.candidates('fork', bike.front.family) : [],
      bike.rear ? this.ctx.sizingData.candidates('shock', bike.rear.family) : [],
    ]);
    const cases = planLoadCases({
      bike: { masses: bike.masses, front: bike.front, rear: bike.rear },
      solo: soloOf(bike),
      request: record.request,
      result: record.result,
      catalogue: { front: forks, rear: shocks },
      thresholds,
    });
    return { record, cases };
  }
}

/** The solo positions: kept on the bike while a case is set, else where its adjusters are now. */
function soloOf(bike: Bike): Partial<Record<EndKind, number>> {
  if (bike.loadCase) return bike.loadCase.solo;
  const solo: Partial<Record<EndKind, number>> = {};
  for (const end of ENDS) {
    const spec = bike[end];
    if (spec) solo[end] = spec.adjuster.position;
  }
  return solo;
}

/** "Load case: solo to With luggage (15 kg)". */
function describeSwitch(from: string | null, to: LoadCaseOption | null): string {
  const target = to ? `${to.name} (${formatNumber(to.massKg, 1)} kg)` : 'solo';
  return `Load case: ${from ?? 'solo'} to ${target}`;
}
