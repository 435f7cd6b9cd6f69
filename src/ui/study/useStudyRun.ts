// One study at a time per part of the panel: start it, follow its progress,
// stop it, and stop it when the panel closes.
import { useCallback, useEffect, useRef, useState } from 'react';
import { startStudy, type RunningStudy, type StudyReply, type StudyRequest } from '../../state/study';

export type Final = Exclude<StudyReply, { kind: 'progress' }>;

export function useStudyRun() {
  const running = useRef<RunningStudy | null>(null);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [busy, setBusy] = useState(false);
  const [final, setFinal] = useState<{ reply: Final; doc: unknown } | null>(null);

  const stop = useCallback(() => {
    running.current?.stop();
    running.current = null;
    setBusy(false);
    setProgress(null);
  }, []);

  const start = useCallback(
    (request: StudyRequest, doc: unknown) => {
      stop();
      setBusy(true);
      setFinal(null);
      running.current = startStudy(request, (reply) => {
        if (reply.kind === 'progress') {
          setProgress({ done: reply.done, total: reply.total });
          return;
        }
        running.current = null;
        setBusy(false);
        setProgress(null);
        setFinal({ reply, doc });
      });
    },
    [stop],
  );

  useEffect(() => stop, [stop]);
  return { start, stop, busy, progress, final };
}
