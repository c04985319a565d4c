import { EntityManager } from 'typeorm';
import { EngineSetting } from '../entities/engine-setting.entity';
import { TargetProfile } from '../entities/target-profile.entity';
import { toProfileRow } from '../services/sizing-data.service';
import { engineSettingSeeds, targetProfileSeeds } from './sizing-defaults';

/** The starting target profiles and engine settings every installation needs to size a bike. */
export async function seedSizingDefaults(manager: EntityManager): Promise<void> {
  await manager.getRepository(TargetProfile).insert(
    targetProfileSeeds.map((p, sortOrder) => ({ ...toProfileRow(p), discipline: p.discipline, sortOrder })),
  );
  await manager.getRepository(EngineSetting).insert(engineSettingSeeds);
}
