import { useMutation } from '@tanstack/react-query';
import { refreshSession } from '../../../lib/api-client.js';
import { toApiRequestError, unreachableServer } from '../../../lib/api-error.js';
import { getAccessToken } from '../../../lib/session-store.js';

export interface CsvDownload {
  blob: Blob;
  fileName: string;
}

async function send(path: string, token: string | null): Promise<Response> {
  try {
    return await fetch(`/api${path}`, {
      headers: { Accept: 'text/csv', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
      credentials: 'same-origin',
    });
  } catch {
    throw unreachableServer();
  }
}

/**
 * A CSV export as a file. A plain link would not carry the bearer token, so the file is fetched
 * (renewing the token once on 401, as every API call does) and handed over as a blob.
 */
export async function fetchCsv(path: string): Promise<CsvDownload> {
  let response = await send(path, getAccessToken());
  if (response.status === 401) {
    const renewed = await refreshSession();
    if (renewed) response = await send(path, renewed.accessToken);
  }
  if (!response.ok) throw await toApiRequestError(response);
  const fileName = /filename="([^"]+)"/.exec(response.headers.get('Content-Disposition') ?? '')?.[1] ?? 'catline-export.csv';
  return { blob: await response.blob(), fileName };
}

/** Saves a blob under a name through a temporary link, as the browser's own download. */
function save({ blob, fileName }: CsvDownload) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // The click has handed the file to the browser; the object URL is no longer needed.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

export function useCsvDownload() {
  return useMutation({
    mutationFn: async (path: string) => {
      const file = await fetchCsv(path);
      save(file);
      return file.fileName;
    },
  });
}
