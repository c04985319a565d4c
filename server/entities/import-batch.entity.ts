import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One confirmed CSV import of the catalogue: who, when, which file (its name as text only) and what it changed. */
@Entity({ name: 'import_batch' })
export class ImportBatch {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer', nullable: true })
  userId!: number | null;

  @Column({ type: 'datetime' })
  at!: Date;

  /** As the clerk's device named it; shown, never used as a path. */
  @Column({ type: 'text' })
  fileName!: string;

  /** Hex SHA-256 of the uploaded bytes. */
  @Column({ type: 'text' })
  contentSha256!: string;

  @Column({ type: 'integer' })
  rowCount!: number;

  @Column({ type: 'integer' })
  createdCount!: number;

  @Column({ type: 'integer' })
  updatedCount!: number;

  @Column({ type: 'integer' })
  unchangedCount!: number;

  /** Count-correction movements written from the on-hand column. */
  @Column({ type: 'integer' })
  movementCount!: number;
}
