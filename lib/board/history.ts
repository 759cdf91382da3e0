/**
 * Undo and redo of board states. Each step keeps a whole state (for the board, the placements
 * array), which stays small because edits share every unchanged placement object with the state
 * before (see edits.ts): a step of a 500-panel board is one array of 500 references plus the
 * objects that changed. Immutable: every function returns a new history, so it can sit in React
 * state as it is.
 *
 * A drag is one step: `begin` when it starts, `push` on every pointer move (coalesced into the
 * open transaction), `commit` when it ends (or `cancel` to put everything back).
 */

export interface HistoryEntry<T> {
  readonly state: T;
  /** what the change that led to this state did ("Move P-003"), for the undo button's title */
  readonly label: string;
}

export interface History<T> {
  /** oldest first */
  readonly past: readonly HistoryEntry<T>[];
  readonly present: HistoryEntry<T>;
  /** the next redo first */
  readonly future: readonly HistoryEntry<T>[];
  /** the entry when the open transaction began; null when none is open */
  readonly base: HistoryEntry<T> | null;
  /** most undo steps kept; older ones are dropped */
  readonly limit: number;
}

export const DEFAULT_HISTORY_LIMIT = 200;

export function createHistory<T>(initial: T, options: { limit?: number } = {}): History<T> {
  return { past: [], present: { state: initial, label: "" }, future: [], base: null, limit: options.limit ?? DEFAULT_HISTORY_LIMIT };
}

/**
 * Records a new state as one undo step and clears the redo list. Inside a transaction it only
 * replaces the present: the whole transaction becomes one step on commit. Pushing the very same
 * state again records nothing.
 */
export function push<T>(h: History<T>, state: T, label = ""): History<T> {
  if (state === h.present.state) return h;
  if (h.base) return { ...h, present: { state, label } };
  return record(h, h.present, { state, label });
}

export function begin<T>(h: History<T>): History<T> {
  return h.base ? h : { ...h, base: h.present };
}

/** Ends the transaction as one step labelled `label`; no step when the state did not change. */
export function commit<T>(h: History<T>, label?: string): History<T> {
  if (!h.base) return h;
  const closed = { ...h, base: null };
  if (h.present.state === h.base.state) return { ...closed, present: h.base };
  return record(closed, h.base, { state: h.present.state, label: label ?? h.present.label });
}

/** Ends the transaction by putting back the state it began with. */
export function cancel<T>(h: History<T>): History<T> {
  return h.base ? { ...h, present: h.base, base: null } : h;
}

export const canUndo = <T>(h: History<T>) => h.base !== null || h.past.length > 0;
export const canRedo = <T>(h: History<T>) => h.base === null && h.future.length > 0;

/** One step back. During a transaction (Ctrl+Z in the middle of a drag) it cancels the transaction. */
export function undo<T>(h: History<T>): History<T> {
  if (h.base) return cancel(h);
  if (h.past.length === 0) return h;
  return { ...h, past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
}

export function redo<T>(h: History<T>): History<T> {
  if (h.base || h.future.length === 0) return h;
  return { ...h, past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) };
}

/** What undo would take back and redo would bring again, for the buttons' titles. */
export const undoLabel = <T>(h: History<T>) => (canUndo(h) ? h.present.label : null);
export const redoLabel = <T>(h: History<T>) => (canRedo(h) ? h.future[0].label : null);

function record<T>(h: History<T>, previous: HistoryEntry<T>, next: HistoryEntry<T>): History<T> {
  const past = [...h.past, previous];
  if (past.length > h.limit) past.splice(0, past.length - h.limit);
  return { ...h, past, present: next, future: [] };
}
