import { useEffect, useState } from 'react';

// react-dom is installed without its type package; flushSync is its documented API.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { flushSync } = require('react-dom') as { flushSync: (update: () => void) => void };

/**
 * True while the browser lays the page out for printing, so charts and tables can take the
 * paper's width. The change is flushed inside `beforeprint`: the print layout is taken right
 * after the event, before React would otherwise render.
 */
export function usePrinting(): boolean {
  const [printing, setPrinting] = useState(false);
  useEffect(() => {
    const set = (value: boolean) => () => flushSync(() => setPrinting(value));
    const before = set(true);
    const after = set(false);
    const media = window.matchMedia?.('print');
    const onMedia = (event: MediaQueryListEvent) => flushSync(() => setPrinting(event.matches));
    window.addEventListener('beforeprint', before);
    window.addEventListener('afterprint', after);
    media?.addEventListener?.('change', onMedia);
    return () => {
      window.removeEventListener('beforeprint', before);
      window.removeEventListener('afterprint', after);
      media?.removeEventListener?.('change', onMedia);
    };
  }, []);
  return printing;
}
