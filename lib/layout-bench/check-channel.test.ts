import { describe, expect, test } from 'vitest';
import { createCheckChannel, isPending, receive, takesAnswer, type ChannelState } from '@/lib/layout-bench/check-channel';

/** A check whose answers the test releases by hand, in any order. */
function handCheck() {
  const calls: { revision: number; input: string; answer: () => void; fail: () => void }[] = [];
  const run = (revision: number, input: string) =>
    new Promise<{ revision: number; check: string }>((resolve, reject) => {
      calls.push({ revision, input, answer: () => resolve({ revision, check: `checked ${input}` }), fail: () => reject(new Error('worker gone')) });
    });
  return { run, calls };
}
const settle = () => new Promise((r) => setTimeout(r, 0));

describe('live-check answers follow the edits, by revision', () => {
  test('an answer for an older edit never replaces the answer for a newer one', () => {
    let s: ChannelState<string, string> = { asked: 3, shown: null };
    s = receive(s, { revision: 3, input: 'c', check: 'C' });
    expect(s.shown?.check).toBe('C');
    expect(isPending(s)).toBe(false);
    // The answers for edits 1 and 2 arrive late: both are dropped.
    s = receive(s, { revision: 1, input: 'a', check: 'A' });
    s = receive(s, { revision: 2, input: 'b', check: 'B' });
    expect(s.shown).toMatchObject({ revision: 3, check: 'C' });
  });

  test('an answer for an edit older than the latest is shown meanwhile, and the check stays pending', () => {
    let s: ChannelState<string, string> = { asked: 2, shown: null };
    s = receive(s, { revision: 1, input: 'a', check: 'A' });
    expect(s.shown?.check).toBe('A');
    expect(isPending(s)).toBe(true);
    s = receive(s, { revision: 2, input: 'b', check: 'B' });
    expect(isPending(s)).toBe(false);
  });

  test('an answer for a revision never asked is refused', () => {
    expect(takesAnswer({ asked: 2, shown: null }, 3)).toBe(false);
    expect(takesAnswer({ asked: 2, shown: null }, 0)).toBe(false);
    expect(takesAnswer({ asked: 2, shown: { revision: 2, input: 'b', check: 'B' } }, 2)).toBe(false);
  });

  test('the channel checks one edit at a time, and of the edits made meanwhile only the newest', async () => {
    const { run, calls } = handCheck();
    const states: ChannelState<string, string>[] = [];
    const channel = createCheckChannel(run, (s) => states.push(s));
    expect(channel.submit('a')).toBe(1);
    expect(channel.submit('b')).toBe(2);
    expect(channel.submit('c')).toBe(3);
    expect(calls.map((c) => c.revision)).toEqual([1]);
    expect(isPending(states.at(-1)!)).toBe(true);

    calls[0].answer();
    await settle();
    // Edit 1's answer is shown while edit 3 is checked; edit 2 is skipped (nobody would see it).
    expect(states.at(-1)!.shown).toMatchObject({ revision: 1, input: 'a', check: 'checked a' });
    expect(calls.map((c) => c.revision)).toEqual([1, 3]);
    expect(calls[1].input).toBe('c');
    expect(isPending(states.at(-1)!)).toBe(true);

    calls[1].answer();
    await settle();
    expect(states.at(-1)!.shown).toMatchObject({ revision: 3, input: 'c', check: 'checked c' });
    expect(isPending(states.at(-1)!)).toBe(false);
  });

  test('a failed check is reported and the next edit is still checked', async () => {
    const { run, calls } = handCheck();
    const errors: unknown[] = [];
    const states: ChannelState<string, string>[] = [];
    const channel = createCheckChannel(
      run,
      (s) => states.push(s),
      (e) => errors.push(e),
    );
    channel.submit('a');
    channel.submit('b');
    calls[0].fail();
    await settle();
    expect(errors).toHaveLength(1);
    expect(calls.map((c) => c.input)).toEqual(['a', 'b']);
    calls[1].answer();
    await settle();
    expect(states.at(-1)!.shown).toMatchObject({ revision: 2, check: 'checked b' });
  });

  test('after dispose no answer is taken', async () => {
    const { run, calls } = handCheck();
    const states: ChannelState<string, string>[] = [];
    const channel = createCheckChannel(run, (s) => states.push(s));
    channel.submit('a');
    channel.dispose();
    calls[0].answer();
    await settle();
    expect(states.every((s) => s.shown === null)).toBe(true);
  });
});
