import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { UnitSystem, WeighIn } from '../../shared/types/garage';
import type { RateUnit } from '../../shared/units';

/** One per account that has saved something: its units preference and its current weigh-in. */
@Entity({ name: 'rider_profile' })
export class RiderProfile {
  @PrimaryColumn({ type: 'integer' })
  userId!: number;

  @Column({ type: 'text', default: 'metric' })
  unitSystem!: UnitSystem;

  @Column({ type: 'text', default: 'N/mm' })
  rateUnit!: RateUnit;

  /** The weigh-in offered for the next pass; each sizing record keeps its own copy. */
  @Column({ type: 'simple-json', nullable: true })
  weighIn!: WeighIn | null;

  @Column({ type: 'datetime', nullable: true })
  weighedAt!: Date | null;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
