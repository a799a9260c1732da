import { useRef, type PointerEvent } from 'react';

export type SwipeDirection = 'left' | 'right' | 'down';

// Our own practice: a deliberate stroke of about 2 cm, mostly along one axis.
export const SWIPE_MIN_PX = 80;

export function swipeDirection(dx: number, dy: number, minPx = SWIPE_MIN_PX): SwipeDirection | null {
  if (Math.abs(dx) >= minPx && Math.abs(dx) > 2 * Math.abs(dy)) return dx > 0 ? 'right' : 'left';
  if (dy >= minPx && dy > 2 * Math.abs(dx)) return 'down';
  return null;
}

// Pointer handlers for an element: right = good, left = defect, down = repeat (the screen decides).
export function useSwipe(onSwipe: (direction: SwipeDirection) => void) {
  const start = useRef<{ x: number; y: number; id: number } | null>(null);
  return {
    onPointerDown: (event: PointerEvent) => {
      start.current = { x: event.clientX, y: event.clientY, id: event.pointerId };
    },
    onPointerUp: (event: PointerEvent) => {
      const from = start.current;
      start.current = null;
      if (!from || from.id !== event.pointerId) return;
      const direction = swipeDirection(event.clientX - from.x, event.clientY - from.y);
      if (direction) onSwipe(direction);
    },
    onPointerCancel: () => {
      start.current = null;
    },
  };
}
