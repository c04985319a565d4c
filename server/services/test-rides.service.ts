/**
 * The test-ride loop on one bike: a report of what the bike did gets one proposed change (from the
 * table's active rows, what was tried for that symptom before, and the end's latest sizing), the
 * change made goes on the bike and into the setup log in one transaction, the ride after it is
 * judged, and a worse change can be taken back the same way. One change at a time: while a made
 * change waits for its verdict, nothing else is proposed or undone on that bike.
 */
import { EntityManager, IsNull, Not } from 'typeorm';
import { checkDamperSetting, tidyPosition } from '../../shared/damping/adjuster-range';
import { nextChange } from '../../shared/damping/next-change';
import { planUndo } from '../../shared/damping/plans';
import { describeAdjusterAt, symptomOf } from '../../shared/damping/symptoms';
import type { TestRideOutcomeInput, TestRideReportInput } from '../../shared/schemas/damping.schema';
import { describeRideStatus, rideStatus } from '../../shared/test-ride/ride-status';
import type { DamperAdjuster, DamperKind as DamperKindView, DamperPlan, ProposedChange, SizingHint, TriedChange } from '../../shared/types/damping';
import type { SetupChangeInput } from '../../shared/types/setup-log';
import type { EndKind } from '../../shared/types/sizing';
import type { TestRideChanged, TestRideJudged, TestRideList, TestRideReported, TestRideView } from '../../shared/types/test-ride';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { SizingRecord } from '../entities/sizing-record.entity';
import { TestRide } from '../entities/test-ride.entity';
import { ConflictError, NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { findOwnedBike } from './bikes.service';
import { DamperKindsService } from './damper-kinds.service';
import { activeRules } from './damping-rules.service';
import { SetupLogService, writeSetupChange } from './setup-log.service';

const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

/** The ride and its bike, or the 404 an unknown id gets when the bike is someone else's. */
async function findOwnedRide(manager: EntityManager, user: AuthUser, rideId: number): Promise<{ ride: TestRide; bike: Bike }> {
  const ride = await manager.findOneBy(TestRide, { id: rideId });
  if (!ride) throw new NotFoundError();
  return { ride, bike: await findOwnedBike(manager, user, ride.bikeId) };
}

function assertProposedChange(ride: TestRide): asserts ride is TestRide & { proposal: { kind: 'change' } } {
  if (ride.proposal.kind !== 'change') throw new ConflictError('This report got no damper change to make: nothing to do here.', 'not-a-change');
}

function changeOf(ride: TestRide): ProposedChange {
  assertProposedChange(ride);
  return ride.proposal.change;
}

function adjusterOf(bike: Bike, end: EndKind, kind: string): DamperAdjuster | undefined {
  return bike[end]?.dampers.find((damper) => damper.kind === kind);
}

/** A made change waiting for its ride: nothing else moves on the bike until it is judged. */
async function assertNothingToJudge(manager: EntityManager, bikeId: number): Promise<void> {
  const waiting = await manager.findOne(TestRide, { select: { id: true }, where: { bikeId, madeAt: Not(IsNull()), outcome: IsNull() } });
  if (waiting) {
    throw new ConflictError(
      `The change of test ride ${waiting.id} is made and not yet judged: tell how the last change rode first (better, worse or the same).`,
      'ride-open',
    );
  }
}

/** The made changes for this symptom at this end, oldest first, as the engine counts them. */
async function triedFor(manager: EntityManager, bikeId: number, input: Pick<TestRideReportInput, 'symptom' | 'end'>): Promise<TriedChange[]> {
  const rows = await manager.find(TestRide, { where: { bikeId, symptom: input.symptom, end: input.end, madeAt: Not(IsNull()) }, order: { id: 'ASC' } });
  // Only a proposed change can be made, and the table's CHECKs keep its columns on such a ride.
  return rows.map((row) => ({
    ruleId: row.ruleId,
    adjuster: row.adjuster!,
    direction: row.direction!,
    from: row.fromPosition!,
    to: row.toPosition!,
    outcome: row.outcome,
    undone: row.undoneAt !== null,
  }));
}

/** The latest pass that sized this end: its decision and headline, for a symptom the spring can cause. */
async function sizingHintFor(manager: EntityManager, bikeId: number, end: EndKind): Promise<SizingHint | null> {
  const summaries = await manager.find(SizingRecord, { select: { id: true, summary: true }, where: { bikeId }, order: { id: 'DESC' } });
  const latest = summaries.find((row) => row.summary[end]);
  if (!latest) return null;
  const record = await manager.findOne(SizingRecord, { select: { id: true, result: true }, where: { id: latest.id } });
  const decision = record?.result[end]?.decision;
  if (!decision) return null;
  return { recordId: latest.id, decision: decision.kind, headline: decision.text.headline };
}

/** The way back from a worse change, from wherever the adjuster is now. */
function undoPlanOf(ride: TestRide, bike: Bike, kinds: readonly DamperKindView[]): DamperPlan {
  const change = changeOf(ride);
  const adjuster = adjusterOf(bike, ride.end, change.adjuster);
  if (!adjuster) {
    return { end: ride.end, steps: [], missing: [`${describeAdjusterAt(ride.end, change.adjuster, kinds)} is no longer on the bike.`], atTarget: false };
  }
  return planUndo(ride.end, adjuster, { from: change.from, to: change.to }, kinds);
}

function stamp(at: Date | null, byId: number | null) {
  return at ? { at: at.toISOString(), byId } : null;
}

function toRideView(ride: TestRide, bike: Bike, kinds: readonly DamperKindView[]): TestRideView {
  const status = rideStatus(ride);
  const undoPlan = status === 'judged' && ride.outcome === 'worse' ? undoPlanOf(ride, bike, kinds) : null;
  const { key, words, situation } = symptomOf(ride.symptom);
  const made = stamp(ride.madeAt, ride.madeById);
  const judged = stamp(ride.judgedAt, ride.judgedById);
  const undone = stamp(ride.undoneAt, ride.undoneById);
  return {
    id: ride.id,
    bikeId: ride.bikeId,
    end: ride.end,
    symptom: { key, words, situation },
    strength: ride.strength,
    note: ride.note,
    reported: { at: ride.reportedAt.toISOString(), byId: ride.reportedById },
    proposal: ride.proposal,
    status,
    statusText: describeRideStatus(ride, undoPlan),
    made: made && { ...made, setupLogEntryId: ride.setupLogEntryId },
    outcome: judged && ride.outcome && { ...judged, outcome: ride.outcome, note: ride.outcomeNote },
    undone: undone && { ...undone, setupLogEntryId: ride.undoLogEntryId },
    supersededAt: ride.supersededAt?.toISOString() ?? null,
    undoPlan,
  };
}

function supersededText(rides: readonly TestRide[]): string | null {
  if (rides.length === 0) return null;
  const named = rides.map((ride) => `test ride ${ride.id} (${changeOf(ride).instruction})`).join('; ');
  return `Not made, so closed and replaced by this report: ${named}. Follow this report's proposal instead.`;
}

export class TestRidesService {
  private readonly log: SetupLogService;
  private readonly kinds: DamperKindsService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {
    this.log = new SetupLogService(ctx);
    this.kinds = new DamperKindsService(ctx);
  }

  /** Every ride of the bike, newest first, and the one waiting to be made or judged. */
  async list(user: AuthUser, bikeId: number): Promise<TestRideList> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const [rows, kinds] = await Promise.all([read.find(TestRide, { where: { bikeId }, order: { id: 'DESC' } }), this.kinds.list()]);
    const rides = rows.map((row) => toRideView(row, bike, kinds));
    return { rides, open: rides.find((ride) => ride.status === 'to-make' || ride.status === 'to-judge') ?? null };
  }

  /**
   * Stores the report with the loop's answer to it. A proposal still waiting to be made is closed
   * (superseded): the new report is about the bike as it is now, and only one change is followed.
   */
  async report(user: AuthUser, bikeId: number, input: TestRideReportInput): Promise<TestRideReported> {
    const kinds = await this.kinds.list();
    const { rideId, superseded } = await this.ctx.db.write(async (manager) => {
      const bike = await findOwnedBike(manager, user, bikeId);
      const spec = bike[input.end];
      if (!spec) throw new ValidationError({ end: `This bike has no ${PART[input.end]} recorded: report a symptom at the end it has.` });
      await assertNothingToJudge(manager, bikeId);
      const proposal = nextChange({
        symptom: input.symptom,
        end: input.end,
        strength: input.strength,
        adjusters: spec.dampers,
        rules: await activeRules(manager, input.symptom, input.end),
        tried: await triedFor(manager, bikeId, input),
        sizing: await sizingHintFor(manager, bikeId, input.end),
        kinds,
      });
      const now = this.ctx.now();
      const pending = await manager.find(TestRide, { where: { bikeId, proposalKind: 'change', supersededAt: IsNull(), madeAt: IsNull() }, order: { id: 'ASC' } });
      if (pending.length > 0) await manager.update(TestRide, pending.map((ride) => ride.id), { supersededAt: now });
      const change = proposal.kind === 'change' ? proposal.change : null;
      const saved = await manager.save(
        manager.create(TestRide, {
          bikeId,
          end: input.end,
          symptom: input.symptom,
          strength: input.strength,
          note: input.note,
          reportedById: user.id,
          reportedAt: now,
          proposal,
          proposalKind: proposal.kind,
          ruleId: change?.ruleId ?? null,
          adjuster: change?.adjuster ?? null,
          direction: change?.direction ?? null,
          fromPosition: change?.from ?? null,
          toPosition: change?.to ?? null,
        }),
      );
      return { rideId: saved.id, superseded: pending };
    });
    return { ride: await this.view(user, rideId), superseded: superseded.map((ride) => ride.id), supersededText: supersededText(superseded) };
  }

  /** The proposed change, put on the bike and logged with the settings before and after, both or neither. */
  async made(user: AuthUser, rideId: number): Promise<TestRideChanged> {
    const kinds = await this.kinds.list();
    const { bikeId, entryId } = await this.ctx.db.write(async (manager) => {
      const { ride, bike } = await findOwnedRide(manager, user, rideId);
      const change = changeOf(ride);
      if (ride.madeAt) throw new ConflictError('This change is made already: ride, then say how it went.', 'already-made');
      if (ride.supersededAt) throw new ConflictError('A later report replaced this proposal: follow that one.', 'superseded');
      const adjuster = adjusterOf(bike, ride.end, change.adjuster);
      const name = describeAdjusterAt(ride.end, change.adjuster, kinds);
      if (!adjuster) throw new ConflictError(`${name} is no longer on the bike: report again for a proposal on the adjusters it has.`, 'adjuster-gone');
      if (tidyPosition(adjuster.position) !== change.from) {
        throw new ConflictError(
          `${name} is at ${adjuster.position} now, not at ${change.from} as when this was proposed: report again for a proposal from where it is.`,
          'adjuster-moved',
        );
      }
      const problem = checkDamperSetting(adjuster, change.to);
      if (problem) throw new ConflictError(`${name} cannot be set to ${change.to} any more: ${problem}`, 'cannot-set');
      const note = `Test ride: ${symptomOf(ride.symptom).words}: ${change.instruction}`;
      const now = this.ctx.now();
      const entryId = await writeSetupChange(manager, user, bike, dampersChange(ride.end, change.adjuster, change.to, note), now);
      await manager.update(TestRide, ride.id, { madeAt: now, madeById: user.id, setupLogEntryId: entryId });
      return { bikeId: bike.id, entryId };
    });
    return { ride: await this.view(user, rideId), ...(await this.log.answer(user, bikeId, entryId)) };
  }

  async judge(user: AuthUser, rideId: number, input: TestRideOutcomeInput): Promise<TestRideJudged> {
    await this.ctx.db.write(async (manager) => {
      const { ride } = await findOwnedRide(manager, user, rideId);
      assertProposedChange(ride);
      if (!ride.madeAt) throw new ConflictError('This change is not made yet: make it and ride before saying how it went.', 'not-made');
      if (ride.outcome) throw new ConflictError(`This ride is judged already (${ride.outcome}).`, 'already-judged');
      await manager.update(TestRide, ride.id, { outcome: input.outcome, outcomeNote: input.note, judgedAt: this.ctx.now(), judgedById: user.id });
    });
    return { ride: await this.view(user, rideId) };
  }

  /** A worse change taken back by its undo plan, as one setup-log entry. */
  async undo(user: AuthUser, rideId: number): Promise<TestRideChanged> {
    const kinds = await this.kinds.list();
    const { bikeId, entryId } = await this.ctx.db.write(async (manager) => {
      const { ride, bike } = await findOwnedRide(manager, user, rideId);
      assertProposedChange(ride);
      if (ride.outcome !== 'worse') throw new ConflictError('Only a change that rode worse is taken back here; set any other by hand in the setup log.', 'not-worse');
      if (ride.undoneAt) throw new ConflictError('This change is taken back already.', 'already-undone');
      await assertNothingToJudge(manager, bike.id);
      const plan = undoPlanOf(ride, bike, kinds);
      if (plan.atTarget) throw new ConflictError('The adjuster is back where it was before this change already: nothing to undo.', 'at-target');
      const [step] = plan.steps;
      if (!step) throw new ConflictError(`This change cannot be taken back by the plan: ${plan.missing.join(' ')}`, 'cannot-undo');
      const note = `Test ride undone: ${symptomOf(ride.symptom).words}: ${step.instruction}`;
      const now = this.ctx.now();
      const entryId = await writeSetupChange(manager, user, bike, dampersChange(ride.end, step.adjuster, step.to, note), now);
      await manager.update(TestRide, ride.id, { undoneAt: now, undoneById: user.id, undoLogEntryId: entryId });
      return { bikeId: bike.id, entryId };
    });
    return { ride: await this.view(user, rideId), ...(await this.log.answer(user, bikeId, entryId)) };
  }

  private async view(user: AuthUser, rideId: number): Promise<TestRideView> {
    const read = this.ctx.db.read.manager;
    const { ride, bike } = await findOwnedRide(read, user, rideId);
    return toRideView(ride, bike, await this.kinds.list());
  }
}

function dampersChange(end: EndKind, adjuster: string, to: number, note: string): SetupChangeInput {
  return { note, [end]: { dampers: { [adjuster]: to } } };
}
