import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { DampingDirection, NextChange, RideOutcome, SymptomKey, SymptomStrength } from '../../shared/types/damping';
import type { EndKind } from '../../shared/types/sizing';

/**
 * One turn of the test-ride loop on a bike: what the rider felt, the change the loop proposed,
 * whether it was made (with its setup-log entry), how it rode, and whether a worse one was taken
 * back. The proposed change's adjuster, direction and positions are copied out of the proposal so
 * the loop can list what was tried for a symptom without parsing JSON.
 */
@Entity({ name: 'test_ride' })
@Index('idx_test_ride_bike', ['bikeId', 'id'])
export class TestRide {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  bikeId!: number;

  @Column({ type: 'text' })
  end!: EndKind;

  @Column({ type: 'text' })
  symptom!: SymptomKey;

  @Column({ type: 'text' })
  strength!: SymptomStrength;

  @Column({ type: 'text', default: '' })
  note!: string;

  @Column({ type: 'integer', nullable: true })
  reportedById!: number | null;

  @Column({ type: 'datetime' })
  reportedAt!: Date;

  @Column({ type: 'simple-json' })
  proposal!: NextChange;

  /** The proposal's kind, for the table's checks and the loop's queries. */
  @Column({ type: 'text' })
  proposalKind!: NextChange['kind'];

  @Column({ type: 'integer', nullable: true })
  ruleId!: number | null;

  @Column({ type: 'text', nullable: true })
  adjuster!: string | null;

  @Column({ type: 'text', nullable: true })
  direction!: DampingDirection | null;

  @Column({ type: 'real', nullable: true })
  fromPosition!: number | null;

  @Column({ type: 'real', nullable: true })
  toPosition!: number | null;

  /** A later report came before the change was made. */
  @Column({ type: 'datetime', nullable: true })
  supersededAt!: Date | null;

  @Column({ type: 'datetime', nullable: true })
  madeAt!: Date | null;

  @Column({ type: 'integer', nullable: true })
  madeById!: number | null;

  @Column({ type: 'integer', nullable: true })
  setupLogEntryId!: number | null;

  @Column({ type: 'text', nullable: true })
  outcome!: RideOutcome | null;

  @Column({ type: 'text', default: '' })
  outcomeNote!: string;

  @Column({ type: 'datetime', nullable: true })
  judgedAt!: Date | null;

  @Column({ type: 'integer', nullable: true })
  judgedById!: number | null;

  @Column({ type: 'datetime', nullable: true })
  undoneAt!: Date | null;

  @Column({ type: 'integer', nullable: true })
  undoneById!: number | null;

  @Column({ type: 'integer', nullable: true })
  undoLogEntryId!: number | null;
}
