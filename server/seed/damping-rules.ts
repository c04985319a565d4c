import { EntityManager } from 'typeorm';
import { SEEDED_DAMPING_RULES } from '../../shared/damping/seeded-rules';
import { DampingRule } from '../entities/damping-rule.entity';

/**
 * The symptom-to-change table's common-practice rows (shared/damping/seeded-rules.ts), on every
 * installation: the loop proposes nothing without them. Loaded once; after that the table is the
 * shop's, edited by the admin and added to by the desk.
 */
export async function seedDampingRules(manager: EntityManager): Promise<void> {
  const now = new Date();
  await manager.getRepository(DampingRule).insert(SEEDED_DAMPING_RULES.map((rule) => ({ ...rule, createdById: null, createdAt: now, updatedAt: now })));
}
