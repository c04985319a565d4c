/**
 * A bike's setup log: every saved pass and every change the rider makes with a spanner, with the
 * settings before and after. A change updates the bike's current values in the same transaction
 * as its entry. The baseline is the settings before the first entry; back-to-baseline is the plan
 * from the current settings back to it.
 */
import { EntityManager } from 'typeorm';
import { ValidationError as YupValidationError } from 'yup';
import { bikeSpecSchema } from '../../shared/schemas/bike.schema';
import { toFieldErrors } from '../../shared/schemas/field-errors';
import { planBackToBaseline } from '../../shared/setup/back-to-baseline';
import { labelsOf } from '../../shared/setup/damper-words';
import { applySetupChange, damperUnitsOf, diffSettings, settingsOf, type DamperUnits } from '../../shared/setup/settings';
import type { GarageBike, SizingRecordSummary } from '../../shared/types/garage';
import type { BackToBaseline, SetupChangeInput, SetupLog, SetupLogEntry as EntryView, SetupSettings } from '../../shared/types/setup-log';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { SetupLogEntry } from '../entities/setup-log-entry.entity';
import { ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { BikesService, findOwnedBike, specOf } from './bikes.service';
import { DamperKindsService } from './damper-kinds.service';
import { summariesByIds } from './sizing-record-view';

/** `units` are the bike's damping adjusters' units as they are now: the stored settings hold positions only. */
function toEntryView(row: SetupLogEntry, sizing: ReadonlyMap<number, SizingRecordSummary>, units: DamperUnits): EntryView {
  return {
    id: row.id,
    bikeId: row.bikeId,
    kind: row.kind,
    note: row.note,
    createdAt: row.createdAt.toISOString(),
    createdById: row.createdById,
    before: row.before,
    after: row.after,
    changes: diffSettings(row.before, row.after, units),
    sizing: row.sizingRecordId === null ? null : (sizing.get(row.sizingRecordId) ?? null),
  };
}

/**
 * The bike's messages under the change's paths: its spring fields are the change's `spring`; its
 * preload is the new spring's when one was given, else what the adjuster setting made of it.
 */
function toChangePaths(fields: Record<string, string>, change: SetupChangeInput): Record<string, string> {
  const mapped: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields)) {
    const at = /^(front|rear)\.(rateNmm|secondRateNmm|breakMm|preloadMm|family)$/.exec(path);
    if (!at) {
      mapped[path] ??= message;
      continue;
    }
    const end = at[1] as 'front' | 'rear';
    const fromAdjuster = at[2] === 'preloadMm' && change[end]?.spring?.preloadMm === undefined;
    mapped[fromAdjuster ? `${end}.preloadPosition` : `${end}.spring.${at[2]}`] ??= message;
  }
  return mapped;
}

export interface SetupChangeAnswer {
  entry: EntryView;
  bike: GarageBike;
}

export interface BaselineAnswer {
  baseline: SetupSettings | null;
  current: SetupSettings;
  /** Null while the log is empty. */
  plan: BackToBaseline | null;
}

/**
 * Puts a change on the bike and writes its log entry, inside the caller's transaction. The load
 * case goes with the settings it was set from: a new spring or a preload turned by hand ends it,
 * unless the change is the load-case switch itself (`patch`), which may also move nothing at all
 * (a case that needs no more preload than the one before it) and is still logged.
 */
export async function writeSetupChange(
  manager: EntityManager,
  user: AuthUser,
  bike: Bike,
  input: SetupChangeInput,
  now: Date,
  patch?: Pick<Bike, 'loadCase'>,
): Promise<number> {
  const moves = !!(input.front || input.rear);
  const outcome = moves || !patch ? applySetupChange(specOf(bike), input) : ({ ok: true, bike: specOf(bike) } as const);
  if (!outcome.ok) throw new ValidationError(outcome.fields);
  try {
    await bikeSpecSchema.validate(outcome.bike, { abortEarly: false });
  } catch (err) {
    if (err instanceof YupValidationError) throw new ValidationError(toChangePaths(toFieldErrors(err), input));
    throw err;
  }
  const touchesPreload = (['front', 'rear'] as const).some((end) => input[end]?.spring || input[end]?.preloadPosition !== undefined);
  const loadCase = patch ? patch.loadCase : touchesPreload ? null : bike.loadCase;
  await manager.save(Bike, { ...bike, ...outcome.bike, loadCase, updatedAt: now });
  const entry = await manager.save(
    manager.create(SetupLogEntry, {
      bikeId: bike.id,
      kind: 'change',
      sizingRecordId: null,
      createdById: user.id,
      note: input.note ?? '',
      before: settingsOf(bike),
      after: settingsOf(outcome.bike),
      createdAt: now,
    }),
  );
  return entry.id;
}

export class SetupLogService {
  private readonly bikes: BikesService;
  private readonly damperKinds: DamperKindsService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {
    this.bikes = new BikesService(ctx);
    this.damperKinds = new DamperKindsService(ctx);
  }

  async list(user: AuthUser, bikeId: number): Promise<SetupLog> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const rows = await read.find(SetupLogEntry, { where: { bikeId }, order: { id: 'ASC' } });
    const sizing = await summariesByIds(
      this.ctx.db,
      rows.map((r) => r.sizingRecordId).filter((id): id is number => id !== null),
    );
    const units = damperUnitsOf(bike);
    return {
      entries: rows.map((row) => toEntryView(row, sizing, units)),
      baseline: rows[0]?.before ?? null,
      current: settingsOf(bike),
    };
  }

  /** Records the change and puts it on the bike, both or neither. */
  async change(user: AuthUser, bikeId: number, input: SetupChangeInput): Promise<SetupChangeAnswer> {
    const entryId = await this.ctx.db.write(async (manager) => {
      const bike = await findOwnedBike(manager, user, bikeId);
      return writeSetupChange(manager, user, bike, input, this.ctx.now());
    });
    return this.answer(user, bikeId, entryId);
  }

  /** The entry just written, as the log lists it, with the bike as it is now. */
  async answer(user: AuthUser, bikeId: number, entryId: number): Promise<SetupChangeAnswer> {
    const log = await this.list(user, bikeId);
    const entry = log.entries.find((e) => e.id === entryId);
    if (!entry) throw new Error(`setup log entry ${entryId} vanished after its write`);
    return { entry, bike: await this.bikes.get(user, bikeId) };
  }

  async backToBaseline(user: AuthUser, bikeId: number): Promise<BaselineAnswer> {
    const read = this.ctx.db.read.manager;
    const bike = await findOwnedBike(read, user, bikeId);
    const first = await read.findOne(SetupLogEntry, { select: { id: true, before: true }, where: { bikeId }, order: { id: 'ASC' } });
    const current = settingsOf(bike);
    if (!first) return { baseline: null, current, plan: null };
    const plan = planBackToBaseline(
      first.before,
      current,
      { front: bike.front?.adjuster, rear: bike.rear?.adjuster },
      { units: damperUnitsOf(bike), labels: labelsOf(await this.damperKinds.list()) },
    );
    return { baseline: first.before, current, plan };
  }
}
