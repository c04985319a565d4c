/** The rider's profile: the units preference (any account) and the current weigh-in, offered for the next pass. */
import { EntityManager } from 'typeorm';
import { DEFAULT_UNITS, defaultRateUnit, toDisplayUnits } from '../../shared/garage/units';
import { totalWeighIn } from '../../shared/garage/weigh-in';
import type { DisplayUnits, UnitSystem, WeighIn, WeighInAnswer } from '../../shared/types/garage';
import type { RateUnit } from '../../shared/units';
import type { AppContext } from '../app-context';
import { RiderProfile } from '../entities/rider-profile.entity';
import { ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { resolveRider } from './bikes.service';

function answerOf(profile: RiderProfile | null): WeighInAnswer {
  const weighIn = profile?.weighIn ?? null;
  return {
    weighIn,
    weighedAt: profile?.weighedAt ? profile.weighedAt.toISOString() : null,
    totals: weighIn ? totalWeighIn(weighIn) : null,
  };
}

async function loadOrNew(manager: EntityManager, userId: number, now: Date): Promise<RiderProfile> {
  return (
    (await manager.findOneBy(RiderProfile, { userId })) ??
    manager.create(RiderProfile, { userId, unitSystem: DEFAULT_UNITS.system, rateUnit: DEFAULT_UNITS.rateUnit, weighIn: null, weighedAt: null, updatedAt: now })
  );
}

/** The weigh-in a rider's next pass uses, or null before the first. */
export async function currentWeighIn(manager: EntityManager, riderId: number): Promise<WeighIn | null> {
  return (await manager.findOneBy(RiderProfile, { userId: riderId }))?.weighIn ?? null;
}

export class ProfileService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {}

  async units(userId: number): Promise<DisplayUnits> {
    const profile = await this.ctx.db.read.manager.findOneBy(RiderProfile, { userId });
    return toDisplayUnits(profile ? { system: profile.unitSystem, rateUnit: profile.rateUnit } : DEFAULT_UNITS);
  }

  async setUnits(userId: number, input: { system: UnitSystem; rateUnit?: RateUnit }): Promise<DisplayUnits> {
    const rateUnit = input.rateUnit ?? defaultRateUnit(input.system);
    await this.ctx.db.write(async (manager) => {
      const now = this.ctx.now();
      const profile = await loadOrNew(manager, userId, now);
      await manager.save(RiderProfile, { ...profile, unitSystem: input.system, rateUnit, updatedAt: now });
    });
    return toDisplayUnits({ system: input.system, rateUnit });
  }

  async weighIn(user: AuthUser, riderId?: number): Promise<WeighInAnswer> {
    const read = this.ctx.db.read.manager;
    const userId = await resolveRider(read, user, riderId);
    return answerOf(await read.findOneBy(RiderProfile, { userId }));
  }

  /** Replaces the rider's weigh-in; its discipline must be one of the shop's target profiles. */
  async setWeighIn(user: AuthUser, weighIn: WeighIn, riderId?: number): Promise<WeighInAnswer> {
    await assertKnownDiscipline(this.ctx, weighIn.discipline, 'discipline');
    const userId = await resolveRider(this.ctx.db.read.manager, user, riderId);
    const saved = await this.ctx.db.write(async (manager) => {
      const now = this.ctx.now();
      const profile = await loadOrNew(manager, userId, now);
      return manager.save(RiderProfile, { ...profile, weighIn, weighedAt: now, updatedAt: now });
    });
    return answerOf(saved);
  }
}

export async function assertKnownDiscipline(ctx: Pick<AppContext, 'sizingData'>, discipline: string, field: string): Promise<void> {
  const profiles = await ctx.sizingData.profileList();
  if (!profiles.has(discipline)) {
    throw new ValidationError({ [field]: `Unknown riding discipline "${discipline}": choose one of ${[...profiles.keys()].join(', ')}.` });
  }
}
