// What the page says when the view-factor worker had to be replaced. The final
// failure of a job (after its retry) is reported by the results pipeline.
import type { RestartEvent } from '../worker/client';
import type { Notice } from './viewSlice';

export function restartNotice(event: RestartEvent): { level: Notice['level']; text: string } | null {
  const what =
    event.reason === 'timeout'
      ? `stopped answering (${event.message})`
      : event.reason === 'crashed'
        ? `stopped (${event.message})`
        : `failed (${event.message})`;
  if (event.retrying)
    return {
      level: 'warning',
      text: `The view-factor worker ${what} and was replaced; the calculation is being tried once more.`,
    };
  // Replaced while idle, or its job was replaced by a newer one: the next calculation runs on the new worker.
  if (event.reason === 'crashed') return { level: 'info', text: `The view-factor worker ${what} and was replaced.` };
  return null; // a job that threw, or a second failure: the pipeline reports the failed calculation itself
}
