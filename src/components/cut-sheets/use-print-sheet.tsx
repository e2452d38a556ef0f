// Printing a cut sheet from a screen: the PDF is fetched, not followed as a link, so a refusal (no
// fitting, a length the plan cannot use) is said in the page in words instead of a page of JSON.
import { useEffect, useState } from 'react';
import { ApiError } from '@/lib/shared/fetch-json';

/** Where a print stands: nothing yet, on its way, the sheet (and whether the new tab opened), or why not. */
export type PrintState = { status: 'idle' } | { status: 'busy' } | { status: 'done'; url: string; opened: boolean } | { status: 'error'; message: string };

/** Reads a PDF response: the sheet's bytes, or an ApiError with the server's words. */
export async function pdfOf(response: Response): Promise<Blob> {
  if (response.ok && (response.headers.get('content-type') ?? '').includes('application/pdf')) return response.blob();
  const data = (await response.json().catch(() => ({}))) as Record<string, unknown>;
  const message = String(data.error ?? data.message ?? `The sheet could not be made (the server answered ${response.status}).`);
  throw new ApiError(response.status, message, (data.issues as Record<string, string>) ?? {});
}

/** Fetches a sheet and opens it in a new tab; the state keeps a link to it in case the tab was blocked. */
export function usePrintSheet() {
  const [state, setState] = useState<PrintState>({ status: 'idle' });
  const url = state.status === 'done' ? state.url : null;
  useEffect(() => (url ? () => URL.revokeObjectURL(url) : undefined), [url]);

  const print = async (request: () => Promise<Response>) => {
    setState({ status: 'busy' });
    try {
      const blob = await pdfOf(await request());
      const href = URL.createObjectURL(blob);
      const tab = window.open(href, '_blank');
      setState({ status: 'done', url: href, opened: tab !== null });
    } catch (e) {
      const message = e instanceof ApiError ? e.message : 'The sheet could not be fetched: check the connection and try again.';
      setState({ status: 'error', message });
    }
  };
  return { state, print, clear: () => setState({ status: 'idle' }) };
}

/** What came of a print: the error in words, or the sheet's links (open, download). */
export function PrintOutcome({ state, filename }: { state: PrintState; filename: string }) {
  if (state.status === 'error') {
    return (
      <p role="alert" className="w-full rounded border-2 border-cut bg-cut-soft px-3 py-2 text-lg font-semibold text-cut">
        {state.message}
      </p>
    );
  }
  if (state.status !== 'done') return null;
  const link = 'inline-flex min-h-11 items-center font-semibold text-accent underline';
  return (
    <p role="status" className="flex w-full flex-wrap items-center gap-x-4 text-lg">
      <span>{state.opened ? 'The sheet opened in a new tab: print it from there at 100 %.' : 'The sheet is ready: open it, then print at 100 %.'}</span>
      <a href={state.url} target="_blank" rel="noopener" className={link}>
        Open the sheet
      </a>
      <a href={state.url} download={filename} className={link}>
        Download the PDF
      </a>
    </p>
  );
}
