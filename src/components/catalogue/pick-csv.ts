import { getDocumentAsync } from 'expo-document-picker';

import type { ImportFile } from '@/hooks/use-imports';

/** The CSV the clerk picks, or undefined when they cancel. On the web the asset carries the File itself. */
export async function pickCsv(): Promise<ImportFile | undefined> {
  const result = await getDocumentAsync({ type: ['text/csv', 'text/plain', '.csv'], copyToCacheDirectory: false });
  if (result.canceled) return undefined;
  const asset = result.assets[0];
  const blob = asset.file ?? (await (await fetch(asset.uri)).blob());
  return { name: asset.name, blob };
}
