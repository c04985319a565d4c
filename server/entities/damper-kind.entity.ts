import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { DamperCircuit, DamperSpeed } from '../../shared/types/damping';

/**
 * A kind of damping adjuster on the shop's list: the six of the trade are seeded by their
 * migration, the admin adds more. Bikes and bike models name their adjusters by its key.
 */
@Entity({ name: 'damper_kind' })
export class DamperKind {
  /** Lower-case words joined by '-': 'rebound', 'hs-compression'. */
  @PrimaryColumn({ type: 'text' })
  key!: string;

  @Column({ type: 'text' })
  label!: string;

  @Column({ type: 'text' })
  circuit!: DamperCircuit;

  @Column({ type: 'text' })
  speed!: DamperSpeed;

  @Column({ type: 'datetime' })
  createdAt!: Date;
}
