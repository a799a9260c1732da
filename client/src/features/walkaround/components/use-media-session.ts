import { useEffect, useRef } from 'react';

export interface HeadsetActions {
  pause: () => void;
  resume: () => void;
  skip: () => void;
  back: () => void;
}

// Headset buttons through the Media Session API where the browser has it. Play/pause pauses and
// resumes; next skips the item and previous goes back. Next is deliberately not "good": a pocket
// press must never record a pass, and a skipped item is offered again at the end.
export function useMediaSession(active: boolean, actions: HeadsetActions): void {
  const latest = useRef(actions);
  useEffect(() => {
    latest.current = actions;
  });
  useEffect(() => {
    const session = globalThis.navigator?.mediaSession;
    if (!active || !session) return;
    const handlers: [MediaSessionAction, () => void][] = [
      ['play', () => latest.current.resume()],
      ['pause', () => latest.current.pause()],
      ['nexttrack', () => latest.current.skip()],
      ['previoustrack', () => latest.current.back()],
    ];
    for (const [action, handler] of handlers) {
      try {
        session.setActionHandler(action, handler);
      } catch {
        // This browser does not know the action: that button does nothing.
      }
    }
    return () => {
      for (const [action] of handlers) {
        try {
          session.setActionHandler(action, null);
        } catch {
          // As above.
        }
      }
    };
  }, [active]);
}
