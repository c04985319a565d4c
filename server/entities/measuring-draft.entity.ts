import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { DraftAnswers, DraftHints, MeasuringStep } from '../../shared/types/garage';

/**
 * The measuring flow in progress on one bike, saved at every step so a closed tab loses nothing.
 * One per bike (its key); saving a pass from it deletes it.
 */
@Entity({ name: 'measuring_draft' })
export class MeasuringDraft {
  @PrimaryColumn({ type: 'integer' })
  bikeId!: number;

  @Column({ type: 'text' })
  step!: MeasuringStep;

  @Column({ type: 'simple-json' })
  answers!: DraftAnswers;

  /** The last pass's readings, when the draft was started to re-measure after adjusting. */
  @Column({ type: 'simple-json', nullable: true })
  hints!: DraftHints | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
