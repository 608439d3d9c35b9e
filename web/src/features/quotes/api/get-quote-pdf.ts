import { apiClient } from '@/lib/api-client';

/** The PDF of a revision a signed-in reader may see, the latest by default (the bearer token goes with it, so not a plain link). */
export async function getQuotePdf(quoteId: string, revision?: number): Promise<Blob> {
  const { data } = await apiClient.get<Blob>(`/quotes/${encodeURIComponent(quoteId)}/pdf`, {
    responseType: 'blob',
    params: revision === undefined ? undefined : { revision },
  });
  return data;
}

/** Fetches the PDF and hands it to the browser as a download named after the quote. */
export async function downloadQuotePdf(quoteId: string, fileName: string, revision?: number): Promise<void> {
  const url = URL.createObjectURL(await getQuotePdf(quoteId, revision));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = fileName;
  anchor.click();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
