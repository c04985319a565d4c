import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One tunable threshold of the sizing engine (a warning limit, a margin), editable by the admin. */
@Entity({ name: 'engine_setting' })
export class EngineSetting {
  @PrimaryColumn({ type: 'text' })
  key!: string;

  @Column({ type: 'real' })
  value!: number;

  @Column({ type: 'text' })
  unit!: string;

  @Column({ type: 'text' })
  label!: string;

  /** "common practice", "from memory", or a published source. */
  @Column({ type: 'text' })
  source!: string;
}
