import { useEffect, useLayoutEffect, useRef, type RefObject } from 'react';
import { Platform } from 'react-native';

const focusable =
  'a[href], button:not([disabled]), input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

function focusableIn(container: HTMLElement): HTMLElement[] {
  return Array.from(container.querySelectorAll<HTMLElement>(focusable)).filter(
    (element) => element.getAttribute('aria-disabled') !== 'true' && element.getAttribute('aria-hidden') !== 'true',
  );
}

/**
 * Keyboard behaviour of a modal dialog in the browser: on open, focus moves to `initial` (or the first
 * control inside `container`); Tab and Shift+Tab wrap inside the dialog; on close, focus goes back to the
 * control that opened it. Escape is handled by the dialog itself.
 */
export function useDialogFocus(visible: boolean, container: RefObject<unknown>, initial?: RefObject<unknown>) {
  const opener = useRef<HTMLElement | null>(null);
  const web = Platform.OS === 'web' && typeof document !== 'undefined';

  // A layout effect runs before the modal's own effects move focus, so it still sees the opener
  useLayoutEffect(() => {
    if (!web || !visible) return;
    opener.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const box = container.current as HTMLElement | null;
    const first = (initial?.current as HTMLElement | null) ?? (box ? focusableIn(box)[0] : null);
    first?.focus();
    return () => {
      const back = opener.current;
      opener.current = null;
      if (back && document.contains(back)) back.focus();
    };
  }, [web, visible, container, initial]);

  useEffect(() => {
    if (!web || !visible) return;
    const onKey = (event: KeyboardEvent) => {
      const box = container.current as HTMLElement | null;
      if (event.key !== 'Tab' || !box) return;
      const items = focusableIn(box);
      if (items.length === 0) return;
      const first = items[0];
      const last = items[items.length - 1];
      const active = document.activeElement;
      const outside = !(active instanceof Node) || !box.contains(active);
      if (event.shiftKey && (active === first || outside)) {
        event.preventDefault();
        last.focus();
      } else if (!event.shiftKey && (active === last || outside)) {
        event.preventDefault();
        first.focus();
      }
    };
    document.addEventListener('keydown', onKey, true);
    return () => document.removeEventListener('keydown', onKey, true);
  }, [web, visible, container]);
}
