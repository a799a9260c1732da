import { useEffect } from 'react';

// Keeps the screen on during a walk-around. The browser drops the lock whenever the page is hidden,
// so it is asked for again each time the page comes back.
export function useWakeLock(active: boolean): void {
  useEffect(() => {
    const wakeLock = globalThis.navigator?.wakeLock;
    if (!active || !wakeLock) return;
    let sentinel: WakeLockSentinel | null = null;
    let cancelled = false;
    const request = () => {
      if (document.visibilityState !== 'visible') return;
      wakeLock
        .request('screen')
        .then((lock) => {
          if (cancelled) void lock.release();
          else sentinel = lock;
        })
        // Refused (battery saver, no permission): the walk-around works, the screen may dim.
        .catch(() => undefined);
    };
    const onVisibility = () => {
      if (document.visibilityState === 'visible') request();
    };
    request();
    document.addEventListener('visibilitychange', onVisibility);
    return () => {
      cancelled = true;
      document.removeEventListener('visibilitychange', onVisibility);
      void sentinel?.release().catch(() => undefined);
    };
  }, [active]);
}
