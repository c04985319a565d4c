import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * Sag windows for one riding discipline, as percentages of the end's travel. Seeded with common
 * practice values and edited by the shop's admin, never fixed in code.
 */
@Entity({ name: 'target_profile' })
export class TargetProfile {
  @PrimaryColumn({ type: 'text' })
  discipline!: string;

  @Column({ type: 'text' })
  label!: string;

  @Column({ type: 'real' }) frontRiderSagMinPct!: number;
  @Column({ type: 'real' }) frontRiderSagMaxPct!: number;
  @Column({ type: 'real' }) frontStaticSagMinPct!: number;
  @Column({ type: 'real' }) frontStaticSagMaxPct!: number;
  @Column({ type: 'real' }) rearRiderSagMinPct!: number;
  @Column({ type: 'real' }) rearRiderSagMaxPct!: number;
  @Column({ type: 'real' }) rearStaticSagMinPct!: number;
  @Column({ type: 'real' }) rearStaticSagMaxPct!: number;

  /** Where the values come from, shown with every result that uses them. */
  @Column({ type: 'text' })
  note!: string;

  @Column({ type: 'integer', default: 0 })
  sortOrder!: number;
}
