import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { SetupEntryKind, SetupSettings } from '../../shared/types/setup-log';

/** One line of a bike's setup log: a saved pass, or a change to its springs, preload or damping adjusters. */
@Entity({ name: 'setup_log_entry' })
@Index('idx_setup_log_bike', ['bikeId', 'id'])
export class SetupLogEntry {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  bikeId!: number;

  @Column({ type: 'text' })
  kind!: SetupEntryKind;

  /** The pass this entry saved (kind 'pass'). */
  @Column({ type: 'integer', nullable: true })
  sizingRecordId!: number | null;

  @Column({ type: 'integer', nullable: true })
  createdById!: number | null;

  @Column({ type: 'text', default: '' })
  note!: string;

  @Column({ type: 'simple-json' })
  before!: SetupSettings;

  @Column({ type: 'simple-json' })
  after!: SetupSettings;

  @Column({ type: 'datetime' })
  createdAt!: Date;
}
