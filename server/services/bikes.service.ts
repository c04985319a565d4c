/**
 * The garage: a rider's bikes, made from a shop model (its values copied, the link kept) or entered
 * by hand. A rider reaches only their own; desk and admin reach every customer's, and may put a bike
 * in a customer's garage.
 */
import { EntityManager, In } from 'typeorm';
import { bikeSpecSchema } from '../../shared/schemas/bike.schema';
import type { Bike as BikeView, BikeSpec, FrontSpec, RearSpec } from '../../shared/types/bike';
import type { GarageBike } from '../../shared/types/garage';
import type { BikeMasses } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { BikeModel } from '../entities/bike-model.entity';
import { Bike } from '../entities/bike.entity';
import { MeasuringDraft } from '../entities/measuring-draft.entity';
import { NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { assertOwnerOrStaff, seesAllCustomers } from '../middleware/ownership';
import { parseInput } from '../routes/validate';
import { isCustomer } from './customers.service';
import { assertKnownDamperKinds } from './damper-kinds.service';
import { latestSummaries } from './sizing-record-view';

export interface BikeCreateInput {
  modelId?: number;
  riderId?: number;
  nickname: string;
  masses?: BikeMasses;
  /** Undefined: copied from the model; null: no such end. */
  front?: FrontSpec | null;
  rear?: RearSpec | null;
}

export interface BikeUpdateInput extends BikeSpec {
  nickname: string;
}

export function specOf(bike: Pick<Bike, 'masses' | 'front' | 'rear'>): BikeSpec {
  return { masses: bike.masses, front: bike.front, rear: bike.rear };
}

/** A bike that is missing and one that is someone else's answer alike, so an id reveals nothing. */
export async function findOwnedBike(manager: EntityManager, user: Pick<AuthUser, 'id' | 'role'>, id: number): Promise<Bike> {
  const bike = await manager.findOneBy(Bike, { id });
  if (!bike) throw new NotFoundError();
  assertOwnerOrStaff(user, bike.ownerId);
  return bike;
}

/**
 * Whose records the caller acts on: their own, or (desk and admin) the customer named. A rider
 * naming anyone else, and staff naming a staff account, get the 404 an unknown id gets.
 */
export async function resolveRider(manager: EntityManager, user: Pick<AuthUser, 'id' | 'role'>, riderId: number | undefined): Promise<number> {
  if (riderId === undefined || riderId === user.id) return user.id;
  assertOwnerOrStaff(user, riderId);
  if (!(await isCustomer(manager, riderId))) throw new NotFoundError('There is no such rider.');
  return riderId;
}

/** The whole bike, checked as the form checks it (field by field, and sizeable as a whole), its damping adjusters of kinds on the shop's list. */
export async function checkSpec(manager: EntityManager, spec: Partial<BikeSpec>): Promise<BikeSpec> {
  const checked = (await parseInput(bikeSpecSchema, spec)) as unknown as BikeSpec;
  await assertKnownDamperKinds(manager, checked);
  return checked;
}

export class BikesService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  /** The rider's garage, oldest bike first, each with its open draft and its latest pass. */
  async garage(user: AuthUser, riderId?: number): Promise<GarageBike[]> {
    const read = this.ctx.db.read.manager;
    const ownerId = await resolveRider(read, user, riderId);
    const bikes = await read.find(Bike, { where: { ownerId }, order: { id: 'ASC' } });
    return this.withGarageFacts(bikes);
  }

  async get(user: AuthUser, id: number): Promise<GarageBike> {
    const bike = await findOwnedBike(this.ctx.db.read.manager, user, id);
    return (await this.withGarageFacts([bike]))[0];
  }

  async create(user: AuthUser, input: BikeCreateInput): Promise<GarageBike> {
    const read = this.ctx.db.read.manager;
    const ownerId = input.riderId ?? user.id;
    if (ownerId !== user.id) {
      if (!seesAllCustomers(user)) throw new ValidationError({ riderId: 'Only the service desk can add a bike to another rider’s garage.' });
      if (!(await isCustomer(read, ownerId))) throw new ValidationError({ riderId: 'There is no such rider.' });
    }
    const model = input.modelId === undefined ? null : await read.findOneBy(BikeModel, { id: input.modelId });
    if (input.modelId !== undefined && !model) throw new ValidationError({ modelId: 'There is no such bike model: choose one from the list.' });
    const spec = await checkSpec(read, {
      masses: input.masses ?? model?.masses,
      front: input.front === undefined ? (model?.front ?? null) : input.front,
      rear: input.rear === undefined ? (model?.rear ?? null) : input.rear,
    });
    const id = await this.ctx.db.write(async (manager) => {
      // The model may have been deleted since it was read: the bike then starts without a link.
      const modelId = model && (await manager.existsBy(BikeModel, { id: model.id })) ? model.id : null;
      const now = this.ctx.now();
      const row = await manager.save(manager.create(Bike, { ownerId, modelId, nickname: input.nickname, ...spec, createdAt: now, updatedAt: now }));
      return row.id;
    });
    return this.get(user, id);
  }

  /** The whole bike as its form holds it; the model link stays. Not a setup change: corrections of what was entered. */
  async update(user: AuthUser, id: number, input: BikeUpdateInput): Promise<GarageBike> {
    const spec = await checkSpec(this.ctx.db.read.manager, input);
    await this.ctx.db.write(async (manager) => {
      const bike = await findOwnedBike(manager, user, id);
      // A corrected spring or adjuster leaves the load case's solo positions meaningless.
      const keepsCase = sameSpringAndAdjuster(bike.front, spec.front) && sameSpringAndAdjuster(bike.rear, spec.rear);
      await manager.save(Bike, { ...bike, ...spec, nickname: input.nickname, loadCase: keepsCase ? bike.loadCase : null, updatedAt: this.ctx.now() });
    });
    return this.get(user, id);
  }

  /** Its draft and setup log go with it; its sizing records stay, for the quotes that refer to them. */
  async delete(user: AuthUser, id: number): Promise<void> {
    await this.ctx.db.write(async (manager) => {
      await findOwnedBike(manager, user, id);
      await manager.delete(Bike, { id });
    });
  }

  private async withGarageFacts(bikes: Bike[]): Promise<GarageBike[]> {
    const read = this.ctx.db.read.manager;
    const ids = bikes.map((b) => b.id);
    const modelIds = [...new Set(bikes.map((b) => b.modelId).filter((m): m is number => m !== null))];
    const [models, drafts, latest] = await Promise.all([
      modelIds.length ? read.find(BikeModel, { select: { id: true, name: true }, where: { id: In(modelIds) } }) : [],
      ids.length ? read.find(MeasuringDraft, { select: { bikeId: true, step: true, updatedAt: true }, where: { bikeId: In(ids) } }) : [],
      latestSummaries(this.ctx.db, ids),
    ]);
    const modelName = new Map(models.map((m) => [m.id, m.name]));
    const draftOf = new Map(drafts.map((d) => [d.bikeId, { step: d.step, updatedAt: d.updatedAt.toISOString() }]));
    return bikes.map((bike) => ({
      ...toBikeView(bike, modelName),
      draft: draftOf.get(bike.id) ?? null,
      lastSizing: latest.get(bike.id) ?? null,
    }));
  }
}

function sameSpringAndAdjuster(a: FrontSpec | RearSpec | null, b: FrontSpec | RearSpec | null): boolean {
  if (!a || !b) return a === b;
  const key = (e: FrontSpec | RearSpec) => [e.rateNmm, e.secondRateNmm, e.breakMm, e.preloadMm, e.adjuster.kind, e.adjuster.mmPerUnit, e.adjuster.position].join('|');
  return key(a) === key(b);
}

export function toBikeView(bike: Bike, modelName: ReadonlyMap<number, string>): BikeView {
  const name = bike.modelId === null ? undefined : modelName.get(bike.modelId);
  return {
    id: bike.id,
    ownerId: bike.ownerId,
    nickname: bike.nickname,
    model: bike.modelId !== null && name !== undefined ? { id: bike.modelId, name } : null,
    loadCase: bike.loadCase?.name ?? null,
    ...specOf(bike),
    createdAt: bike.createdAt.toISOString(),
    updatedAt: bike.updatedAt.toISOString(),
  };
}
