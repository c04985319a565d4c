import { EntityManager } from 'typeorm';
import { EngineSetting } from '../entities/engine-setting.entity';
import { TargetProfile } from '../entities/target-profile.entity';
import { engineSettingSeeds, targetProfileSeeds } from './sizing-defaults';

/** The starting target profiles and engine settings every installation needs to size a bike. */
export async function seedSizingDefaults(manager: EntityManager): Promise<void> {
  await manager.getRepository(TargetProfile).insert(
    targetProfileSeeds.map((p, sortOrder) => ({
      discipline: p.discipline,
      label: p.label,
      frontRiderSagMinPct: p.front.riderSagPct[0],
      frontRiderSagMaxPct: p.front.riderSagPct[1],
      frontStaticSagMinPct: p.front.staticSagPct[0],
      frontStaticSagMaxPct: p.front.staticSagPct[1],
      rearRiderSagMinPct: p.rear.riderSagPct[0],
      rearRiderSagMaxPct: p.rear.riderSagPct[1],
      rearStaticSagMinPct: p.rear.staticSagPct[0],
      rearStaticSagMaxPct: p.rear.staticSagPct[1],
      note: p.note,
      sortOrder,
    })),
  );
  await manager.getRepository(EngineSetting).insert(engineSettingSeeds);
}
