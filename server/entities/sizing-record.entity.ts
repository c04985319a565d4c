import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { upgradeLegacyResult } from '../../shared/sizing/legacy-result';
import type { EndSummary, SizingSource, WeighIn } from '../../shared/types/garage';
import type { SizingRequest, SizingResult, TargetProfile } from '../../shared/types/sizing';

/** Stored results stay as their engine made them; read, an older one gains the shape the API answers today. */
const storedResult = {
  to: (result: SizingResult) => result,
  from: (result: SizingResult | null) => (result ? upgradeLegacyResult(result) : result),
};

/**
 * One saved pass of the sizing engine: the request it ran, its answer, the target profile and the
 * weigh-in it used, and the engine's version. The setup log and the desk's quotes refer to it.
 */
@Entity({ name: 'sizing_record' })
@Index('idx_sizing_record_bike', ['bikeId', 'id'])
@Index('idx_sizing_record_rider', ['riderId', 'id'])
export class SizingRecord {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  /** The bike's owner, kept when the bike is deleted. */
  @Column({ type: 'integer' })
  riderId!: number;

  /** Null once the bike is deleted. */
  @Column({ type: 'integer', nullable: true })
  bikeId!: number | null;

  /** Who ran it: the rider, or the desk on the rider's behalf. */
  @Column({ type: 'integer', nullable: true })
  createdById!: number | null;

  @Column({ type: 'text' })
  source!: SizingSource;

  @Column({ type: 'text' })
  discipline!: string;

  @Column({ type: 'text' })
  engineVersion!: string;

  @Column({ type: 'simple-json' })
  request!: SizingRequest;

  @Column({ type: 'simple-json', transformer: storedResult })
  result!: SizingResult;

  @Column({ type: 'simple-json' })
  profile!: TargetProfile;

  @Column({ type: 'simple-json', nullable: true })
  weighIn!: WeighIn | null;

  /** The few figures lists and charts show, so they need not read the whole result. */
  @Column({ type: 'simple-json' })
  summary!: { profileLabel: string; front: EndSummary | null; rear: EndSummary | null };

  @Column({ type: 'datetime' })
  createdAt!: Date;
}
