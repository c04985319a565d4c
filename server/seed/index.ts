/**
 * Loads seed data, each part once: a part that has a seed_record row is skipped, so a restart
 * changes nothing. Baseline parts load on every installation; demo parts only with the demo on.
 * Each later part of the product appends its own part to the list it belongs to.
 */
import { EntityManager } from 'typeorm';
import { Database } from '../data-source';
import { SeedRecord } from '../entities/seed-record.entity';
import { seedDemoAccounts } from './demo-accounts';
import { seedDemoBikeModels } from './demo-bike-models';
import { seedDemoShopSettings } from './demo-shop-settings';
import { seedDemoCatalogue } from './demo-catalogue';
import { seedDemoWorkshop } from './demo-workshop';
import { seedDecisionEngine } from './decision-engine';
import { seedSizingDefaults } from './sizing-baseline';
import { seedDampingRules } from './damping-rules';

interface SeedPart {
  name: string;
  run: (manager: EntityManager) => Promise<void>;
}

const baselineParts: SeedPart[] = [
  { name: 'sizing-defaults', run: seedSizingDefaults },
  { name: 'decision-engine', run: seedDecisionEngine },
  { name: 'damping-rules', run: seedDampingRules },
];

const demoParts: SeedPart[] = [
  { name: 'demo-workshop', run: seedDemoWorkshop },
  { name: 'demo-catalogue', run: seedDemoCatalogue },
  { name: 'demo-accounts', run: seedDemoAccounts },
  { name: 'demo-bike-models', run: seedDemoBikeModels },
  { name: 'demo-shop-settings', run: seedDemoShopSettings },
];

/** Returns the names of the parts loaded by this call. */
export async function seed(db: Database, options: { demo: boolean }): Promise<string[]> {
  const loaded: string[] = [];
  for (const part of [...baselineParts, ...(options.demo ? demoParts : [])]) {
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
