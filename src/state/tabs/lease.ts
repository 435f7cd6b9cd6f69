// One writer per sketch across browser tabs. The tab that writes the autosave
// holds a lease: its id under LEASE_KEY in localStorage. A tab that opens while
// another holds it asks over a channel ("who holds it?"); when the holder
// answers, the new tab does not save and offers to take over; when nobody
// answers (the holder was closed without letting go), it takes the lease. Every
// write checks the lease first, so even two tabs that start at the same moment
// never both keep writing: the one that finds another id stops and says so.

export const LEASE_KEY = 'tautline.sketch.writer';

/** How long a new tab waits for the holder to answer before taking a lease left behind, ms. */
export const LEASE_ANSWER_MS = 400;

export type TabMessage =
  | { type: 'who'; from: string } // a tab that opened asks who holds the lease
  | { type: 'here'; from: string; to: string } // the holder answers
  | { type: 'taken'; from: string } // a tab took the lease over
  | { type: 'released'; from: string }; // the holder closed and let go

/** A message channel between tabs of the same site (BroadcastChannel in the browser; a fake in tests). */
export interface TabChannel {
  post(message: TabMessage): void;
  listen(listener: (message: TabMessage) => void): void;
  close(): void;
}

export type LeaseState = 'holder' | 'waiting' | 'elsewhere';

export interface LeaseOptions {
  storage: Storage;
  channel: TabChannel | null;
  id?: string;
  /** Told whenever the state changes (to 'elsewhere' when another tab holds or took the lease). */
  onChange?: (state: LeaseState) => void;
  /** Told, while another tab holds the lease, that it closed and let go (this tab may now take over). */
  onReleased?: () => void;
}

export class TabLease {
  readonly id: string;
  private state: LeaseState = 'waiting';
  private timer: ReturnType<typeof setTimeout> | null = null;

  constructor(private readonly options: LeaseOptions) {
    this.id = options.id ?? newTabId();
    options.channel?.listen((m) => this.receive(m));
    const holder = this.read();
    if (holder === null || holder === this.id || !options.channel) {
      // Nobody holds it, or no way to ask: this tab writes (the check before each write still guards).
      this.claim(false);
      return;
    }
    options.channel.post({ type: 'who', from: this.id });
    this.timer = setTimeout(() => {
      this.timer = null;
      if (this.state === 'waiting') this.claim(false);
    }, LEASE_ANSWER_MS);
  }

  get current(): LeaseState {
    return this.state;
  }

  /** May this tab write now? Re-reads the lease, so a tab that lost it stops at once. */
  mayWrite(): boolean {
    if (this.state !== 'holder') return false;
    const holder = this.read();
    if (holder === this.id) return true;
    if (holder === null) {
      this.write(); // cleared by hand or by a tab that closed: still ours
      return true;
    }
    this.set('elsewhere');
    return false;
  }

  /** Take the lease from whichever tab holds it; that tab stops saving. */
  takeOver(): void {
    this.claim(true);
  }

  /** Let go (the tab closes); the next tab to open takes the lease without asking. */
  release(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    if (this.state === 'holder' && this.read() === this.id) {
      try {
        this.options.storage.removeItem(LEASE_KEY);
      } catch {
        /* storage blocked: the next tab asks and, with no answer, takes it */
      }
      // A tab that was told "elsewhere" is waiting for this.
      this.options.channel?.post({ type: 'released', from: this.id });
    }
    this.options.channel?.close();
  }

  private claim(announce: boolean): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.write();
    if (announce) this.options.channel?.post({ type: 'taken', from: this.id });
    this.set('holder');
  }

  private receive(m: TabMessage): void {
    if (m.from === this.id) return;
    if (m.type === 'who' && this.state === 'holder' && this.read() === this.id) {
      this.options.channel?.post({ type: 'here', from: this.id, to: m.from });
    } else if (m.type === 'here' && m.to === this.id && this.state === 'waiting') {
      if (this.timer) clearTimeout(this.timer);
      this.timer = null;
      this.set('elsewhere');
    } else if (m.type === 'released' && this.state === 'elsewhere') {
      // Not taken by itself: this tab's copy would replace the one the closed tab saved last.
      this.options.onReleased?.();
    } else if (m.type === 'taken' && this.state !== 'elsewhere') {
      if (this.timer) clearTimeout(this.timer);
      this.timer = null;
      this.set('elsewhere');
    }
  }

  private set(state: LeaseState): void {
    if (state === this.state) return;
    this.state = state;
    this.options.onChange?.(state);
  }

  private read(): string | null {
    try {
      return this.options.storage.getItem(LEASE_KEY);
    } catch {
      return null;
    }
  }

  private write(): void {
    try {
      this.options.storage.setItem(LEASE_KEY, this.id);
    } catch {
      /* storage full or blocked: autosave reports that itself */
    }
  }
}

function newTabId(): string {
  const c = globalThis.crypto as Crypto | undefined;
  if (c && typeof c.randomUUID === 'function') return c.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}

/** The browser's channel between tabs of this site, or null where there is none. */
export function browserTabChannel(name = 'tautline.tabs'): TabChannel | null {
  if (typeof BroadcastChannel === 'undefined') return null;
  const channel = new BroadcastChannel(name);
  return {
    post: (message) => channel.postMessage(message),
    listen: (listener) => {
      channel.onmessage = (e: MessageEvent<TabMessage>) => listener(e.data);
    },
    close: () => channel.close(),
  };
}
