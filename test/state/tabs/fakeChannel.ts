// Tabs of one site in a test: a message bus like BroadcastChannel (a message
// reaches every other open channel, later, never the sender).
import type { TabChannel, TabMessage } from '../../../src/state/tabs/lease';

export class FakeBus {
  private listeners = new Set<{ listener: (m: TabMessage) => void }>();
  /** Every message posted, in order (tests read it to see who said what). */
  readonly log: TabMessage[] = [];

  channel(): TabChannel {
    const me = { listener: (_m: TabMessage) => {} };
    let open = true;
    this.listeners.add(me);
    return {
      post: (message) => {
        if (!open) return;
        this.log.push(message);
        for (const other of this.listeners) if (other !== me) queueMicrotask(() => other.listener(message));
      },
      listen: (listener) => {
        me.listener = listener;
      },
      close: () => {
        open = false;
        this.listeners.delete(me);
      },
    };
  }
}
