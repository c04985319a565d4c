/**
 * Loads the demo scenario, each part once: a part that has a seed_record row is skipped, so a
 * restart changes nothing. Each later part of the product appends its own part here.
 */
import { Database } from '../data-source';
import { SeedRecord } from '../entities/seed-record.entity';
import { EntityManager } from 'typeorm';
import { seedDemoWorkshop } from './demo-workshop';

interface SeedPart {
  name: string;
  run: (manager: EntityManager) => Promise<void>;
}

const demoParts: SeedPart[] = [{ name: 'demo-workshop', run: seedDemoWorkshop }];

/** Returns the names of the parts loaded by this call. */
export async function seedDemo(db: Database): Promise<string[]> {
  const loaded: string[] = [];
  for (const part of demoParts) {
    const done = await db.write(async (manager) => {
      const records = manager.getRepository(SeedRecord);
      if (await records.existsBy({ name: part.name })) return false;
      await part.run(manager);
      await records.insert({ name: part.name, appliedAt: new Date() });
      return true;
    });
    if (done) loaded.push(part.name);
  }
  return loaded;
}
