import { api } from '@/api/client';

/**
 * Fetches a CSV with the session's bearer token and saves it through an object URL: a plain link
 * would reach the server without the Authorization header.
 */
export async function downloadCsv(path: string, fileName: string): Promise<void> {
  const blob = await api.get<Blob>(path, { responseType: 'blob' });
  const url = URL.createObjectURL(blob);
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = fileName;
    document.body.appendChild(link);
    link.click();
    link.remove();
  } finally {
    // The click has handed the blob to the download; the URL is no longer needed.
    setTimeout(() => URL.revokeObjectURL(url), 0);
  }
}
