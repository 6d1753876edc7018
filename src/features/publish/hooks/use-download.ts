import { useCallback, useEffect, useRef, useState } from 'react';
import { fetchExport, type ExportProgress } from '../api/fetch-export';

export type DownloadState =
  { status: 'idle' } | { status: 'busy'; progress: ExportProgress | null } | { status: 'done'; filename: string } | { status: 'error'; message: string };

/** Hands a Blob to the browser as a download under `filename`. */
export function saveBlob(blob: Blob, filename: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // The download has started from the URL by now; a late revoke keeps slow browsers safe.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/**
 * Downloads an export through fetch, so the button can say "Preparing …", show bytes as they
 * arrive and put a failure in words (a bare link would show the browser's error page instead).
 */
export function useDownload() {
  const [state, setState] = useState<DownloadState>({ status: 'idle' });
  const abort = useRef<AbortController | null>(null);
  useEffect(() => () => abort.current?.abort(), []);

  const start = useCallback(async (url: string, fallbackName: string) => {
    abort.current?.abort();
    const ctl = new AbortController();
    abort.current = ctl;
    setState({ status: 'busy', progress: null });
    try {
      const file = await fetchExport(url, { signal: ctl.signal, onProgress: (progress) => setState({ status: 'busy', progress }) });
      const name = file.filename ?? fallbackName;
      saveBlob(file.blob, name);
      setState({ status: 'done', filename: name });
    } catch (e) {
      if ((e as Error).name === 'AbortError') return;
      setState({ status: 'error', message: (e as Error).message });
    }
  }, []);

  return { state, start };
}
