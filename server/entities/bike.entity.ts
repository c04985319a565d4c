import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { FrontSpec, RearSpec } from '../../shared/types/bike';
import type { ActiveLoadCase } from '../../shared/types/load-case';
import type { BikeMasses } from '../../shared/types/sizing';

/**
 * A bike in a rider's garage: a copy of a shop model's values (the link kept) or values entered by
 * hand, with the rider's own changes. Its current springs, preload and damping adjuster settings live here;
 * the setup log keeps how they got there.
 */
@Entity({ name: 'bike' })
export class Bike {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Index('idx_bike_owner')
  @Column({ type: 'integer' })
  ownerId!: number;

  /** Null when entered by hand, or once the model is deleted. */
  @Column({ type: 'integer', nullable: true })
  modelId!: number | null;

  @Column({ type: 'text' })
  nickname!: string;

  @Column({ type: 'simple-json' })
  masses!: BikeMasses;

  @Column({ type: 'simple-json', nullable: true })
  front!: FrontSpec | null;

  @Column({ type: 'simple-json', nullable: true })
  rear!: RearSpec | null;

  /** The load case set now, with the solo positions to go back to; null while it rides solo. */
  @Column({ type: 'simple-json', nullable: true })
  loadCase!: ActiveLoadCase | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
