import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { DampingClaim, DampingDirection, RuleSource, SymptomKey } from '../../shared/types/damping';
import type { EndKind } from '../../shared/types/sizing';

/**
 * One row of the symptom-to-change table: for a symptom at an end, an adjuster kind to try and
 * which way. Seeded with common practice (server/seed/damping-rules.ts); the admin edits rows and
 * the desk adds the shop's own. Rows are switched off, never deleted: test rides refer to them.
 */
@Entity({ name: 'damping_rule' })
@Index('idx_damping_rule_symptom', ['symptom', 'end', 'priority'])
export class DampingRule {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'text' })
  symptom!: SymptomKey;

  @Column({ type: 'text' })
  end!: EndKind;

  /** A damper_kind key. */
  @Column({ type: 'text' })
  adjuster!: string;

  @Column({ type: 'text' })
  direction!: DampingDirection;

  @Column({ type: 'integer' })
  priority!: number;

  @Column({ type: 'text' })
  why!: string;

  @Column({ type: 'text' })
  feelFor!: string;

  @Column({ type: 'text', nullable: true })
  claim!: DampingClaim | null;

  @Column({ type: 'text' })
  source!: RuleSource;

  @Column({ type: 'boolean', default: true })
  active!: boolean;

  /** Null for the seeded rows. */
  @Column({ type: 'integer', nullable: true })
  createdById!: number | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
