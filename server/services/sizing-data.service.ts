/**
 * What every sizing reads (target profiles, engine settings, the candidate springs of a fit), and
 * the totals of the counter's searches, which the same spring and stock writes change, cached in
 * memory. Whatever writes those tables calls `invalidate` inside its write, so the next sizing or
 * search sees the change at once.
 */
import { buildWarningThresholds } from '../../shared/sizing';
import type { CatalogueSpring, TargetProfile as Profile, WarningThresholds } from '../../shared/types/sizing';
import { Database } from '../data-source';
import { EngineSetting } from '../entities/engine-setting.entity';
import { SpringKind, SpringRate } from '../entities/spring-rate.entity';
import { TargetProfile } from '../entities/target-profile.entity';

export function toProfile(row: TargetProfile): Profile {
  return {
    discipline: row.discipline,
    label: row.label,
    front: {
      riderSagPct: [row.frontRiderSagMinPct, row.frontRiderSagMaxPct],
      staticSagPct: [row.frontStaticSagMinPct, row.frontStaticSagMaxPct],
    },
    rear: {
      riderSagPct: [row.rearRiderSagMinPct, row.rearRiderSagMaxPct],
      staticSagPct: [row.rearStaticSagMinPct, row.rearStaticSagMaxPct],
    },
    note: row.note,
  };
}

/** The columns of a target profile's row; the inverse of toProfile. */
export function toProfileRow(input: Pick<Profile, 'label' | 'note' | 'front' | 'rear'>): Partial<TargetProfile> {
  return {
    label: input.label,
    note: input.note,
    frontRiderSagMinPct: input.front.riderSagPct[0],
    frontRiderSagMaxPct: input.front.riderSagPct[1],
    frontStaticSagMinPct: input.front.staticSagPct[0],
    frontStaticSagMaxPct: input.front.staticSagPct[1],
    rearRiderSagMinPct: input.rear.riderSagPct[0],
    rearRiderSagMaxPct: input.rear.riderSagPct[1],
    rearStaticSagMinPct: input.rear.staticSagPct[0],
    rearStaticSagMaxPct: input.rear.staticSagPct[1],
  };
}

function toCatalogueSpring(row: SpringRate): CatalogueSpring {
  return {
    sku: row.sku,
    kind: row.kind,
    family: row.family,
    rateNmm: row.rateNmm,
    secondRateNmm: row.secondRateNmm,
    breakMm: row.breakMm,
    freeLengthMm: row.freeLengthMm,
    maxDeflectionMm: row.maxDeflectionMm,
    onHand: row.onHand,
    reserved: row.reserved,
  };
}

/** Distinct searches whose totals are kept; past that, all are dropped and counted afresh. */
const MAX_SEARCH_TOTALS = 1000;

export class SizingDataCache {
  private profiles?: Promise<Map<string, Profile>>;
  private thresholds?: Promise<WarningThresholds>;
  private springs = new Map<string, Promise<CatalogueSpring[]>>();
  private searchTotals = new Map<string, Promise<number>>();

  constructor(private readonly db: Database) {}

  /** Drops everything; the next read goes to the database. */
  invalidate(): void {
    this.profiles = undefined;
    this.thresholds = undefined;
    this.springs.clear();
    this.searchTotals.clear();
  }

  profileList(): Promise<Map<string, Profile>> {
    if (!this.profiles) {
      this.profiles = this.db.read
        .getRepository(TargetProfile)
        .find({ order: { sortOrder: 'ASC', discipline: 'ASC' } })
        .then((rows) => new Map(rows.map((row) => [row.discipline, toProfile(row)])));
      forgetOnFailure(this.profiles, () => (this.profiles = undefined));
    }
    return this.profiles;
  }

  warningThresholds(): Promise<WarningThresholds> {
    if (!this.thresholds) {
      this.thresholds = this.db.read
        .getRepository(EngineSetting)
        .find()
        .then((rows) => buildWarningThresholds(rows));
      forgetOnFailure(this.thresholds, () => (this.thresholds = undefined));
    }
    return this.thresholds;
  }

  /** The active springs of one fit, softest first. */
  candidates(kind: SpringKind, family: string): Promise<CatalogueSpring[]> {
    const key = `${kind}\u0000${family}`;
    let found = this.springs.get(key);
    if (!found) {
      found = this.db.read
        .getRepository(SpringRate)
        .find({ where: { kind, family, active: true }, order: { rateNmm: 'ASC', sku: 'ASC' } })
        .then((rows) => rows.map(toCatalogueSpring));
      this.springs.set(key, found);
      forgetOnFailure(found, () => this.springs.delete(key));
    }
    return found;
  }

  /**
   * The number of springs one catalogue search finds, keyed by its SQL and parameters: counting an
   * unfiltered page walks the whole index (about 10 ms at 100,000 springs), on every page turn.
   */
  searchTotal(key: string, count: () => Promise<number>): Promise<number> {
    let found = this.searchTotals.get(key);
    if (!found) {
      if (this.searchTotals.size >= MAX_SEARCH_TOTALS) this.searchTotals.clear();
      found = count();
      this.searchTotals.set(key, found);
      forgetOnFailure(found, () => this.searchTotals.delete(key));
    }
    return found;
  }
}

/** A failed read is not kept, so the next request tries again. */
function forgetOnFailure(pending: Promise<unknown>, forget: () => void): void {
  pending.catch(forget);
}
