import { useRef, useState } from 'react';

import { arrowStep } from './web-keys';

type Focusable = { focus?: () => void } | null;

/**
 * A group of controls that is one Tab stop (a roving tabindex): only the chosen control, or the one the
 * arrow keys last reached, has tabIndex 0; the arrow keys (and Home, End) move focus among the enabled ones.
 */
export function useRovingFocus(count: number, chosen: number, isEnabled: (index: number) => boolean) {
  const refs = useRef<Focusable[]>([]);
  const [reached, setReached] = useState<number | null>(null);
  const firstEnabled = () => {
    for (let i = 0; i < count; i += 1) if (isEnabled(i)) return i;
    return 0;
  };
  const tabStop = reached !== null && reached < count ? reached : chosen >= 0 && chosen < count ? chosen : firstEnabled();

  /** Moves focus from `index` for an arrow key; answers the index reached, or null when the key is not an arrow. */
  const moveFrom = (index: number, key: string): number | null => {
    const step = arrowStep(key);
    if (step === null || count === 0) return null;
    const order = Array.from({ length: count }, (_, i) => i).filter(isEnabled);
    if (order.length === 0) return null;
    let next: number;
    if (step === 'first') next = order[0];
    else if (step === 'last') next = order[order.length - 1];
    else {
      const at = order.indexOf(index);
      next = order[(at + step + order.length) % order.length];
    }
    setReached(next);
    refs.current[next]?.focus?.();
    return next;
  };

  return {
    /** Give each control `ref={bind(index)}`. */
    bind: (index: number) => (node: Focusable) => {
      refs.current[index] = node;
    },
    tabIndexOf: (index: number): 0 | -1 => (index === tabStop ? 0 : -1),
    moveFrom,
    /** Call when a control is pressed, so Tab comes back to it. */
    reach: setReached,
  };
}
