import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { Readings } from '@shared/types/sizing';
import type { SizingRecord, SizingRecordSummary } from '@shared/types/garage';

type RecordsAnswer = { records: SizingRecordSummary[] };
type RecordAnswer = { record: SizingRecord };

/** A bike's saved passes, oldest first. */
export function useBikeRecords(bikeId: number | undefined) {
  return useSWR<RecordsAnswer, ApiError>(bikeId ? riderKeys.bikeRecords(bikeId) : null, (path: string) =>
    api.get<RecordsAnswer>(path),
  );
}

export function useSizingRecord(id: number | undefined) {
  return useSWR<RecordAnswer, ApiError>(id ? riderKeys.record(id) : null, (path: string) =>
    api.get<RecordAnswer>(path),
  );
}

export type SizingRecordInput = {
  useDraft?: boolean;
  readings?: { front?: Readings; rear?: Readings };
  dampingRatio?: number;
};

/** Works a pass out and stores it (the server also logs it and deletes the draft). */
export async function createSizingRecord(bikeId: number, input: SizingRecordInput): Promise<SizingRecord> {
  const { record } = await api.post<RecordAnswer>(riderKeys.bikeRecords(bikeId), input);
  return record;
}
