/** Sizing records as the API answers them: the summary lists and charts use, and the whole record. */
import { In, SelectQueryBuilder } from 'typeorm';
import type { EndSummary, SizingRecord as SizingRecordView, SizingRecordSummary } from '../../shared/types/garage';
import type { EndResult, FrontRequest, RearRequest, SizingRequest, SizingResult } from '../../shared/types/sizing';
import { Database } from '../data-source';
import { SizingRecord } from '../entities/sizing-record.entity';

function endSummary(end: EndResult | undefined, request: FrontRequest | RearRequest | undefined): EndSummary | null {
  if (!end || !request) return null;
  return {
    mode: end.mode,
    travelMm: end.travelMm,
    staticSagMm: end.staticSagMm,
    riderSagMm: end.riderSagMm,
    staticSagPct: end.staticSagPct,
    riderSagPct: end.riderSagPct,
    targetRiderSagPct: end.target.riderSagPct,
    targetStaticSagPct: end.target.staticSagPct,
    verdict: end.verdict,
    decision: end.decision.kind,
    installedRateNmm: end.installedRateNmm,
    preloadMm: request.preloadMm,
    bestRateNmm: end.recommendation.best?.rateNmm ?? null,
  };
}

export function summarise(request: SizingRequest, result: SizingResult): SizingRecord['summary'] {
  return {
    profileLabel: result.profileLabel,
    front: endSummary(result.front, request.front),
    rear: endSummary(result.rear, request.rear),
  };
}

type SummaryRow = Pick<SizingRecord, 'id' | 'bikeId' | 'riderId' | 'createdById' | 'source' | 'discipline' | 'engineVersion' | 'summary' | 'createdAt'>;

/** The columns a summary needs: never the request or result, which are large. */
export const SUMMARY_COLUMNS: (keyof SummaryRow)[] = ['id', 'bikeId', 'riderId', 'createdById', 'source', 'discipline', 'engineVersion', 'summary', 'createdAt'];

export function toRecordSummary(row: SummaryRow): SizingRecordSummary {
  return {
    id: row.id,
    bikeId: row.bikeId,
    riderId: row.riderId,
    createdById: row.createdById,
    source: row.source,
    discipline: row.discipline,
    profileLabel: row.summary.profileLabel,
    engineVersion: row.engineVersion,
    createdAt: row.createdAt.toISOString(),
    front: withDecision(row.summary.front),
    rear: withDecision(row.summary.rear),
  };
}

/** Summaries stored before decisions carry none. */
function withDecision(summary: EndSummary | null): EndSummary | null {
  return summary && summary.decision === undefined ? { ...summary, decision: null } : summary;
}

export function toRecordView(row: SizingRecord): SizingRecordView {
  return { ...toRecordSummary(row), request: row.request, result: row.result, profile: row.profile, weighIn: row.weighIn };
}

function summaryQuery(db: Database): SelectQueryBuilder<SizingRecord> {
  return db.read
    .getRepository(SizingRecord)
    .createQueryBuilder('r')
    .select(SUMMARY_COLUMNS.map((c) => `r.${c}`));
}

/** A bike's passes, oldest first: the list and the chart of sag over time. */
export async function summariesForBike(db: Database, bikeId: number): Promise<SizingRecordSummary[]> {
  const rows = await summaryQuery(db).where('r.bikeId = :bikeId', { bikeId }).orderBy('r.id', 'ASC').getMany();
  return rows.map(toRecordSummary);
}

export async function summariesByIds(db: Database, ids: number[]): Promise<Map<number, SizingRecordSummary>> {
  if (ids.length === 0) return new Map();
  const rows = await db.read.getRepository(SizingRecord).find({ select: SUMMARY_COLUMNS, where: { id: In(ids) } });
  return new Map(rows.map((row) => [row.id, toRecordSummary(row)]));
}

/** The newest pass of each bike given. */
export async function latestSummaries(db: Database, bikeIds: number[]): Promise<Map<number, SizingRecordSummary>> {
  if (bikeIds.length === 0) return new Map();
  const rows = await summaryQuery(db)
    .where('r.id IN (SELECT MAX(s.id) FROM sizing_record s WHERE s.bikeId IN (:...bikeIds) GROUP BY s.bikeId)', { bikeIds })
    .getMany();
  return new Map(rows.map((row) => [row.bikeId as number, toRecordSummary(row)]));
}
