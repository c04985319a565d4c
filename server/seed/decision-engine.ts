import { EntityManager } from 'typeorm';
import { EngineSetting } from '../entities/engine-setting.entity';
import { RiderProfile } from '../entities/rider-profile.entity';
import { TargetProfile } from '../entities/target-profile.entity';
import { decisionSettingSeeds } from './sizing-defaults';

/**
 * Brings an installation seeded before the one-decision engine up to it: the two settings the
 * decision reads, and no "two-up" discipline, since a passenger is now a load case on the solo
 * rider's spring rather than a reason to size a stiffer one. Weigh-ins that named it move to
 * touring, which has the same windows. A fresh installation passes through without a change.
 */
export async function seedDecisionEngine(manager: EntityManager): Promise<void> {
  const settings = manager.getRepository(EngineSetting);
  for (const seed of decisionSettingSeeds()) {
    if (!(await settings.existsBy({ key: seed.key }))) await settings.insert(seed);
  }
  await manager.getRepository(TargetProfile).delete({ discipline: 'two-up' });
  const profiles = manager.getRepository(RiderProfile);
  const named = await profiles.createQueryBuilder('p').where('p.weighIn LIKE :pattern', { pattern: '%"discipline":"two-up"%' }).getMany();
  for (const profile of named) {
    if (profile.weighIn?.discipline !== 'two-up') continue;
    await profiles.update({ userId: profile.userId }, { weighIn: { ...profile.weighIn, discipline: 'touring' } });
  }
}
