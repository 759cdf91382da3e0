/**
 * Saving a board as the person works: each change is sent after a short pause, naming the
 * version it started from. What the server answers decides what happens next:
 *   - saved: the new version is kept; a change made meanwhile is sent next;
 *   - conflict (someone else saved first): saving stops until the person reloads;
 *   - refused (the server says the input is wrong): the same document is never sent again;
 *     the refusal stays on screen until the person's next change is sent;
 *   - anything else (the network, a server fault): the document is sent again, waiting
 *     longer each time (1 s, 2 s, 4 s … up to 30 s).
 * No React here, so the rules above are tested on their own (tests/unit/board/autosave.test.ts).
 */

export type AutosaveState = "saved" | "pending" | "saving" | "conflict" | "refused" | "error";
export type Outcome = "conflict" | "refused" | "retry";

export interface AutosaveSnapshot<D> {
  state: AutosaveState;
  version: number;
  /** what the last failed send threw; null after a save */
  error: unknown;
  /** the document the server refused, to read its field names against */
  refused: D | null;
}

export interface Timers {
  set: (run: () => void, ms: number) => unknown;
  clear: (handle: unknown) => void;
}

export interface AutosaveOptions<D> {
  version: number;
  send: (doc: D, version: number) => Promise<{ version: number }>;
  classify: (error: unknown) => Outcome;
  onChange: (snapshot: AutosaveSnapshot<D>) => void;
  /** pause after a change before sending, ms */
  delayMs?: number;
  timers?: Timers;
}

const realTimers: Timers = { set: (run, ms) => setTimeout(run, ms), clear: (h) => clearTimeout(h as ReturnType<typeof setTimeout>) };

/** 1 s, 2 s, 4 s … never more than 30 s between attempts. */
export const retryDelayMs = (attempt: number) => Math.min(30_000, 1000 * 2 ** Math.max(0, attempt - 1));

export function createAutosave<D>(options: AutosaveOptions<D>) {
  const timers = options.timers ?? realTimers;
  const delay = options.delayMs ?? 600;
  let snapshot: AutosaveSnapshot<D> = { state: "saved", version: options.version, error: null, refused: null };
  let pending: D | null = null;
  let inFlight = false;
  let blocked = false;
  let attempts = 0;
  let timer: unknown = null;

  const update = (next: Partial<AutosaveSnapshot<D>>) => {
    snapshot = { ...snapshot, ...next };
    options.onChange(snapshot);
  };
  const wait = (ms: number) => {
    if (timer !== null) timers.clear(timer);
    timer = timers.set(() => {
      timer = null;
      void flush();
    }, ms);
  };

  async function flush() {
    if (inFlight || blocked || pending === null) return;
    const doc = pending;
    pending = null;
    inFlight = true;
    update({ state: "saving" });
    try {
      const saved = await options.send(doc, snapshot.version);
      attempts = 0;
      update({ state: pending ? "pending" : "saved", version: saved.version, error: null, refused: null });
    } catch (error) {
      const outcome = options.classify(error);
      if (outcome === "conflict") {
        blocked = true;
        update({ state: "conflict", error });
      } else if (outcome === "refused") {
        // Not sent again: the same input would be refused the same way.
        update({ state: pending ? "pending" : "refused", error, refused: doc });
      } else {
        attempts++;
        pending ??= doc;
        update({ state: "error", error });
      }
    } finally {
      inFlight = false;
      if (pending !== null && !blocked) wait(attempts > 0 ? retryDelayMs(attempts) : delay);
    }
  }

  return {
    get snapshot() {
      return snapshot;
    },
    /** A change the person made: send it after the pause (replacing any change not yet sent). */
    schedule(doc: D) {
      if (blocked) return;
      pending = doc;
      attempts = 0;
      update({ state: "pending" });
      wait(delay);
    },
    /** After a reload: start again from the version on screen. */
    reset(version: number) {
      blocked = false;
      pending = null;
      attempts = 0;
      if (timer !== null) timers.clear(timer);
      timer = null;
      update({ state: "saved", version, error: null, refused: null });
    },
    dispose() {
      if (timer !== null) timers.clear(timer);
      timer = null;
    },
  };
}

export type Autosave<D> = ReturnType<typeof createAutosave<D>>;
