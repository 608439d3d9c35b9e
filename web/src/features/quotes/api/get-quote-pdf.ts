import { apiClient } from '@/lib/api-client';

/** The PDF of the revision a signed-in reader may see (the bearer token goes with it, so not a plain link). */
export async function getQuotePdf(quoteId: string): Promise<Blob> {
  const { data } = await apiClient.get<Blob>(`/quotes/${encodeURIComponent(quoteId)}/pdf`, { responseType: 'blob' });
  return data;
}

/** Fetches the PDF and hands it to the browser as a download named after the quote. */
export async function downloadQuotePdf(quoteId: string, fileName: string): Promise<void> {
  const url = URL.createObjectURL(await getQuotePdf(quoteId));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = fileName;
  anchor.click();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
