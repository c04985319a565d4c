/**
 * The measuring flow's draft, one per bike, saved at every step: a save replaces the step and the
 * answers in one statement, so saving the same thing twice leaves the same draft. Starting afresh
 * to re-measure after adjusting puts the last pass's readings beside the fields as hints.
 */
import { EntityManager } from 'typeorm';
import { ValidationError as YupValidationError } from 'yup';
import { draftSaveSchema, type DraftContext } from '../../shared/schemas/draft.schema';
import { toFieldErrors } from '../../shared/schemas/field-errors';
import type { DraftAnswers, DraftHints, MeasuringDraft as DraftView, MeasuringStep } from '../../shared/types/garage';
import type { EndKind } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { MeasuringDraft } from '../entities/measuring-draft.entity';
import { SizingRecord } from '../entities/sizing-record.entity';
import { ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { findOwnedBike } from './bikes.service';

const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

export function toDraftView(row: MeasuringDraft): DraftView {
  return {
    bikeId: row.bikeId,
    step: row.step,
    answers: row.answers,
    hints: row.hints,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The answers, each value checked against the bike: its ends, and each end's travel for the sags. */
async function checkDraft(bike: Bike, body: unknown): Promise<{ step: MeasuringStep; answers: DraftAnswers }> {
  const context: DraftContext = { travelMm: { front: bike.front?.travelMm, rear: bike.rear?.wheelTravelMm } };
  let checked: { step: MeasuringStep; answers: DraftAnswers };
  try {
    checked = (await draftSaveSchema.validate(body ?? {}, { abortEarly: false, stripUnknown: true, context })) as typeof checked;
  } catch (err) {
    if (err instanceof YupValidationError) throw new ValidationError(toFieldErrors(err));
    throw err;
  }
  const fields: Record<string, string> = {};
  for (const end of ['front', 'rear'] as const) {
    if (bike[end]) continue;
    if (checked.answers.ends?.includes(end)) fields['answers.ends'] = `This bike has no ${PART[end]} recorded: choose the other end, or add it to the bike.`;
    if (checked.answers[end]) fields[`answers.${end}`] = `This bike has no ${PART[end]} recorded.`;
  }
  if (Object.keys(fields).length > 0) throw new ValidationError(fields);
  return checked;
}

async function hintsFromLastPass(manager: EntityManager, bikeId: number): Promise<DraftHints | null> {
  const last = await manager.findOne(SizingRecord, { select: { id: true, request: true, createdAt: true }, where: { bikeId }, order: { id: 'DESC' } });
  if (!last) return null;
  const { front, rear } = last.request;
  return {
    fromRecordId: last.id,
    measuredAt: last.createdAt.toISOString(),
    ends: [...(front ? ['front' as const] : []), ...(rear ? ['rear' as const] : [])],
    front: front?.readings ?? null,
    rear: rear?.readings ?? null,
  };
}

export class DraftsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  async get(user: AuthUser, bikeId: number): Promise<DraftView | null> {
    const read = this.ctx.db.read.manager;
    await findOwnedBike(read, user, bikeId);
    const row = await read.findOneBy(MeasuringDraft, { bikeId });
    return row ? toDraftView(row) : null;
  }

  /** Saves the step and answers, creating the draft if need be; hints from a re-measure start stay. */
  async save(user: AuthUser, bikeId: number, body: unknown): Promise<DraftView> {
    const bike = await findOwnedBike(this.ctx.db.read.manager, user, bikeId);
    const { step, answers } = await checkDraft(bike, body);
    return this.ctx.db.write(async (manager) => {
      await findOwnedBike(manager, user, bikeId);
      const now = this.ctx.now();
      await manager
        .createQueryBuilder()
        .insert()
        .into(MeasuringDraft)
        .values({ bikeId, step, answers, hints: null, createdAt: now, updatedAt: now })
        .orUpdate(['step', 'answers', 'updatedAt'], ['bikeId'])
        .execute();
      return toDraftView(await manager.findOneByOrFail(MeasuringDraft, { bikeId }));
    });
  }

  /** A fresh draft in place of any open one; with `remeasure`, hinted with the last pass's readings. */
  async start(user: AuthUser, bikeId: number, remeasure: boolean): Promise<DraftView> {
    return this.ctx.db.write(async (manager) => {
      await findOwnedBike(manager, user, bikeId);
      const now = this.ctx.now();
      const hints = remeasure ? await hintsFromLastPass(manager, bikeId) : null;
      await manager.delete(MeasuringDraft, { bikeId });
      const row = await manager.save(manager.create(MeasuringDraft, { bikeId, step: 'weigh-in', answers: {}, hints, createdAt: now, updatedAt: now }));
      return toDraftView(row);
    });
  }

  /** Deleting a draft that is not there is not an error: the client may retry a delete. */
  async delete(user: AuthUser, bikeId: number): Promise<void> {
    await this.ctx.db.write(async (manager) => {
      await findOwnedBike(manager, user, bikeId);
      await manager.delete(MeasuringDraft, { bikeId });
    });
  }
}
