'use client';

import { useEffect, useState, useSyncExternalStore } from 'react';

/** `on`: the screen stays awake; `off`: the browser refused or let it go (battery saver, tab hidden); `unsupported`: no Screen Wake Lock API. */
export type WakeState = 'pending' | 'on' | 'off' | 'unsupported';

/**
 * Keeps the screen awake while `active` (the cutter's view is open) with the Screen Wake Lock API, where the browser
 * has it. The browser drops the lock whenever the page is hidden, so it is asked for again when the page is visible
 * once more, and after a tap if it was refused (some browsers grant it only after a gesture). Released on leaving.
 */
export function useWakeLock(active: boolean): WakeState {
  const [state, setState] = useState<WakeState>('pending');
  // Known only in the browser: the server's render (and hydration) assume the API is there.
  const supported = useSyncExternalStore(neverChanges, hasWakeLock, () => true);

  useEffect(() => {
    if (!active || !supported) return;
    let sentinel: WakeLockSentinel | null = null;
    let asking = false;
    let gone = false;

    const acquire = async () => {
      if (gone || asking || document.visibilityState !== 'visible' || (sentinel && !sentinel.released)) return;
      asking = true;
      try {
        const lock = await navigator.wakeLock.request('screen');
        if (gone) {
          await lock.release();
          return;
        }
        sentinel = lock;
        setState('on');
        lock.addEventListener('release', () => {
          if (!gone) setState('off');
        });
      } catch {
        // Refused (no permission, battery saver): say so on screen; a tap or the page coming back tries again.
        if (!gone) setState('off');
      } finally {
        asking = false;
      }
    };
    const onVisibility = () => {
      if (document.visibilityState === 'visible') void acquire();
    };
    const onTap = () => void acquire();

    void acquire();
    document.addEventListener('visibilitychange', onVisibility);
    document.addEventListener('pointerdown', onTap);
    return () => {
      gone = true;
      document.removeEventListener('visibilitychange', onVisibility);
      document.removeEventListener('pointerdown', onTap);
      const held = sentinel;
      sentinel = null;
      if (held && !held.released) void held.release().catch(() => undefined);
    };
  }, [active, supported]);

  return supported ? state : 'unsupported';
}

const neverChanges = () => () => undefined;
const hasWakeLock = () => 'wakeLock' in navigator && !!navigator.wakeLock;
