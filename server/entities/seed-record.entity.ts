import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One row per part of the demo scenario that has been loaded, so a restart never loads it twice. */
@Entity({ name: 'seed_record' })
export class SeedRecord {
  @PrimaryColumn({ type: 'text' })
  name!: string;

  @Column({ type: 'datetime' })
  appliedAt!: Date;
}
