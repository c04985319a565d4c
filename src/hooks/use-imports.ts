import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { ImportBatchPage, ImportConfirmAnswer, ImportDryRun } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

/** What the picker gives on the web: the browser's File, or a blob with its name. */
export type ImportFile = { name: string; blob: Blob };

/** `unit` is that of rate columns whose header names none; the confirm must send the dry run's. */
function uploadForm(file: ImportFile, unit: RateUnit, token?: string): FormData {
  const form = new FormData();
  form.append('file', file.blob, file.name);
  form.append('unit', unit);
  if (token) form.append('token', token);
  return form;
}

/** The past import batches, newest first. */
export function useImportBatches(page: number) {
  return useSWR<ImportBatchPage, ApiError>(counterKeys.imports(page), (path: string) => api.get<ImportBatchPage>(path));
}

/**
 * The two steps of an import. The dry run writes nothing; the confirm sends the same file with
 * the dry run's token, so the server can refuse a file that changed in between.
 */
export function useImportSteps() {
  const { mutate } = useSWRConfig();
  return {
    dryRun: (file: ImportFile, unit: RateUnit) => api.post<ImportDryRun>('/imports/dry-run', uploadForm(file, unit)),
    confirm: async (file: ImportFile, unit: RateUnit, token: string) => {
      const answer = await api.post<ImportConfirmAnswer>('/imports', uploadForm(file, unit, token));
      await mutate(counterKeys.isImports);
      await mutate(counterKeys.isCatalogue);
      return answer;
    },
  };
}
