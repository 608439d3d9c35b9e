import { useEffect, useMemo } from 'react';

/** An object URL for a fetched file (for <img>), released when the component lets go of it. */
export function useObjectUrl(blob: Blob | undefined): string | null {
  const url = useMemo(() => (blob ? URL.createObjectURL(blob) : null), [blob]);
  useEffect(
    () => () => {
      if (url) URL.revokeObjectURL(url);
    },
    [url],
  );
  return url;
}
