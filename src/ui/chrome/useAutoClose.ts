import { useEffect, useRef } from 'react';
import type { Notice } from '../../state/viewSlice';

/** How long an information or warning notice shows before it closes by itself, ms. */
export const NOTICE_SHOW_MS = 6000;

/** Errors, and notices that offer an action, stay until closed. */
export function closesByItself(n: Notice): boolean {
  return n.level !== 'error' && !n.action;
}

/** Close each notice that closes by itself NOTICE_SHOW_MS after it first showed. */
export function useAutoClose(notices: readonly Notice[], dismiss: (id: number) => void): void {
  const timers = useRef(new Map<number, ReturnType<typeof setTimeout>>());
  useEffect(() => {
    const live = timers.current;
    const shown = new Set(notices.map((n) => n.id));
    for (const n of notices)
      if (closesByItself(n) && !live.has(n.id))
        live.set(
          n.id,
          setTimeout(() => {
            live.delete(n.id);
            dismiss(n.id);
          }, NOTICE_SHOW_MS),
        );
    for (const [id, t] of live)
      if (!shown.has(id)) {
        clearTimeout(t);
        live.delete(id);
      }
  }, [notices, dismiss]);
  useEffect(() => {
    const live = timers.current;
    return () => {
      for (const t of live.values()) clearTimeout(t);
      live.clear();
    };
  }, []);
}
