/**
 * The live check's answers in the order of the edits. Every document handed to the check is tagged with a revision
 * (1, 2, 3… in the order of the edits); the answer carries the revision it was made for, and an answer is taken
 * only when it is newer than the one on screen, so an answer for an older edit never overwrites a newer one,
 * whatever order the answers come back in (a worker that failed and the check run again here, a worker restarted).
 *
 * The channel also keeps the check from falling behind: one check runs at a time, and edits made meanwhile wait as
 * one — the newest; the ones in between are never checked (nobody will see them). Framework-free, so it is tested
 * in Node with a check whose answers the test releases in any order.
 */

export interface CheckAnswer<I, T> {
  revision: number;
  /** The input the answer is for (the same object that was submitted). */
  input: I;
  check: T;
}

export interface ChannelState<I, T> {
  /** The revision of the latest input submitted (0 before any). */
  asked: number;
  /** The newest answer taken so far. */
  shown: CheckAnswer<I, T> | null;
}

/** Whether `answer` may replace `shown`: only an answer for a newer revision, and never one that was not asked. */
export function takesAnswer(state: ChannelState<unknown, unknown>, revision: number): boolean {
  return revision <= state.asked && revision > (state.shown?.revision ?? 0);
}

/** The state after an answer arrives: unchanged when the answer is for an edit older than the one shown. */
export function receive<I, T>(state: ChannelState<I, T>, answer: CheckAnswer<I, T>): ChannelState<I, T> {
  return takesAnswer(state, answer.revision) ? { ...state, shown: answer } : state;
}

/** Pending: the latest input has not been answered yet (the last answer stays on screen meanwhile). */
export const isPending = (state: ChannelState<unknown, unknown>) => (state.shown?.revision ?? 0) !== state.asked;

export interface CheckChannel<I> {
  /** Hands the check a new input; returns its revision. */
  submit(input: I): number;
  /** Stops taking answers (a check still running is left to finish, unheard). */
  dispose(): void;
}

/**
 * A channel over `run` (which checks one input, tagged with its revision, and answers with that revision).
 * `onChange` hears every change of state: a submit (now pending) and every answer taken.
 */
export function createCheckChannel<I, T>(
  run: (revision: number, input: I) => Promise<{ revision: number; check: T }>,
  onChange: (state: ChannelState<I, T>) => void,
  onError: (error: unknown) => void = () => {},
): CheckChannel<I> {
  let state: ChannelState<I, T> = { asked: 0, shown: null };
  let running = false;
  let waiting: { revision: number; input: I } | null = null;
  let disposed = false;
  const inputs = new Map<number, I>();

  const start = (revision: number, input: I) => {
    running = true;
    inputs.set(revision, input);
    run(revision, input).then(
      (answer) => {
        const asked = inputs.get(answer.revision);
        inputs.delete(revision);
        if (disposed) return;
        if (asked !== undefined) {
          const after = receive(state, { revision: answer.revision, input: asked, check: answer.check });
          if (after !== state) onChange((state = after));
        }
        runWaiting();
      },
      (error) => {
        inputs.delete(revision);
        if (disposed) return;
        onError(error);
        runWaiting();
      },
    );
  };
  const runWaiting = () => {
    running = false;
    if (!waiting) return;
    const w = waiting;
    waiting = null;
    start(w.revision, w.input);
  };

  return {
    submit(input) {
      const revision = state.asked + 1;
      onChange((state = { ...state, asked: revision }));
      if (running) waiting = { revision, input };
      else start(revision, input);
      return revision;
    },
    dispose() {
      disposed = true;
      waiting = null;
    },
  };
}
