import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { FrontSpec, RearSpec } from '../../shared/types/bike';
import type { BikeMasses } from '../../shared/types/sizing';

/**
 * A bike model in the shop's catalogue, from which a rider's bike is made. Its parts are JSON in
 * the shape of the sizing request's `bike`, `front` and `rear` (shared/types/bike.ts).
 */
@Entity({ name: 'bike_model' })
export class BikeModel {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  /** Unique regardless of case. */
  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  @Column({ type: 'simple-json' })
  masses!: BikeMasses;

  @Column({ type: 'simple-json', nullable: true })
  front!: FrontSpec | null;

  @Column({ type: 'simple-json', nullable: true })
  rear!: RearSpec | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
