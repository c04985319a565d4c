/**
 * Saved passes. A pass is built from the bike, the weigh-in and the readings (or taken as a whole
 * request), run through the same engine service as POST /api/sizing, and stored with the profile
 * and engine version it used; saving it finishes the bike's draft and adds a pass to its setup log,
 * all in one transaction. Desk and admin save passes for any rider's bike, marked source 'desk'.
 */
import { completeReadings } from '../../shared/garage/draft-readings';
import { buildSizingRequest, endsOf } from '../../shared/garage/build-sizing-request';
import { validateSizingRequest } from '../../shared/schemas/sizing.schema';
import { settingsOf } from '../../shared/setup/settings';
import type { SizingRecord as SizingRecordView, SizingRecordSummary, WeighIn } from '../../shared/types/garage';
import type { EndKind, Readings, SizingRequest } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { MeasuringDraft } from '../entities/measuring-draft.entity';
import { SetupLogEntry } from '../entities/setup-log-entry.entity';
import { SizingRecord } from '../entities/sizing-record.entity';
import { NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { assertOwnerOrStaff, seesAllCustomers } from '../middleware/ownership';
import { findOwnedBike, specOf } from './bikes.service';
import { assertKnownDiscipline, currentWeighIn } from './profile.service';
import { runSizingWithProfile } from './sizing.service';
import { summarise, summariesForBike, toRecordView } from './sizing-record-view';

export interface SizingRecordInput {
  ends?: EndKind[];
  readings?: Partial<Record<EndKind, unknown>>;
  useDraft: boolean;
  weighIn?: WeighIn;
  dampingRatio?: number;
  request?: unknown;
}

const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

/**
 * The sizing schema's messages under the paths of this route's body: the readings under
 * `readings.<end>`, the weigh-in's figures under `weighIn`, anything else is the stored bike's.
 */
function toBodyPaths(fields: Record<string, string>): Record<string, string> {
  const mapped: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields)) {
    const readings = /^(front|rear)\.readings(.*)$/.exec(path);
    if (readings) mapped[`readings.${readings[1]}${readings[2]}`] = message;
    else if (path === 'discipline' || path.startsWith('rider.')) mapped[`weighIn${path === 'discipline' ? '.discipline' : ''}`] ??= message;
    else if (path === 'dampingRatio') mapped.dampingRatio = message;
    else mapped[`bike.${path}`] = message;
  }
  return mapped;
}

export class SizingRecordsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {}

  async create(user: AuthUser, bikeId: number, input: SizingRecordInput): Promise<SizingRecordView> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const { request, weighIn } = input.request !== undefined ? await this.fromFullRequest(input.request) : await this.fromBike(bike, input);
    const { result, profile } = await runSizingWithProfile(this.ctx.sizingData, request);
    const id = await this.ctx.db.write(async (manager) => {
      const current = await manager.findOneBy(Bike, { id: bikeId });
      if (!current) throw new NotFoundError();
      const now = this.ctx.now();
      const record = await manager.save(
        manager.create(SizingRecord, {
          riderId: current.ownerId,
          bikeId,
          createdById: user.id,
          source: seesAllCustomers(user) ? 'desk' : 'rider',
          discipline: result.discipline,
          engineVersion: result.engineVersion,
          request,
          result,
          profile,
          weighIn,
          summary: summarise(request, result),
          createdAt: now,
        }),
      );
      const settings = settingsOf(current);
      await manager.insert(SetupLogEntry, {
        bikeId,
        kind: 'pass',
        sizingRecordId: record.id,
        createdById: user.id,
        note: '',
        before: settings,
        after: settings,
        createdAt: now,
      });
      await manager.delete(MeasuringDraft, { bikeId });
      return record.id;
    });
    return this.get(user, id);
  }

  /** The bike's passes, oldest first; each carries the sags for the chart of rider sag over time. */
  async listForBike(user: AuthUser, bikeId: number): Promise<SizingRecordSummary[]> {
    await findOwnedBike(this.ctx.db.read.manager, user, bikeId);
    return summariesForBike(this.ctx.db, bikeId);
  }

  async get(user: AuthUser, id: number): Promise<SizingRecordView> {
    const row = await this.ctx.db.read.manager.findOneBy(SizingRecord, { id });
    if (!row) throw new NotFoundError();
    assertOwnerOrStaff(user, row.riderId);
    return toRecordView(row);
  }

  private async fromFullRequest(body: unknown): Promise<{ request: SizingRequest; weighIn: null }> {
    const checked = validateSizingRequest(body);
    if (!checked.ok) {
      throw new ValidationError(Object.fromEntries(Object.entries(checked.fields).map(([path, message]) => [path ? `request.${path}` : 'request', message])));
    }
    await assertKnownDiscipline(this.ctx, checked.value.discipline, 'request.discipline');
    return { request: checked.value, weighIn: null };
  }

  private async fromBike(bike: Bike, input: SizingRecordInput): Promise<{ request: SizingRequest; weighIn: WeighIn }> {
    const read = this.ctx.db.read.manager;
    const weighIn = input.weighIn ?? (await currentWeighIn(read, bike.ownerId));
    if (!weighIn) throw new ValidationError({ weighIn: 'There is no weigh-in yet: weigh in first, or send one with the pass.' });
    await assertKnownDiscipline(this.ctx, weighIn.discipline, 'weighIn.discipline');
    const draft = input.useDraft ? await read.findOneBy(MeasuringDraft, { bikeId: bike.id }) : null;
    if (input.useDraft && !draft) throw new ValidationError({ useDraft: 'This bike has no open draft: measure again, or send the readings.' });

    const ends = input.ends ?? draft?.answers.ends ?? endsOf(bike);
    const fields: Record<string, string> = {};
    const missing = ends.filter((end) => !bike[end]);
    if (missing.length > 0) fields.ends = `This bike has no ${missing.map((e) => PART[e]).join(' or ')} recorded: size the other end, or add it to the bike.`;
    const readings: Partial<Record<EndKind, Readings>> = {};
    for (const end of ends) {
      if (draft) {
        const complete = completeReadings(draft.answers[end]);
        if (complete) readings[end] = complete;
        else fields[`readings.${end}`] = `The ${PART[end]} readings in the draft are not complete: take every length, pushed and lifted where chosen.`;
      } else if (input.readings?.[end] !== undefined) {
        readings[end] = input.readings[end] as Readings;
      }
    }
    if (Object.keys(fields).length > 0) throw new ValidationError(fields);

    const built = buildSizingRequest({ bike: specOf(bike), weighIn, ends, readings, dampingRatio: input.dampingRatio });
    const checked = validateSizingRequest(built);
    if (!checked.ok) throw new ValidationError(toBodyPaths(checked.fields));
    return { request: checked.value, weighIn };
  }
}
