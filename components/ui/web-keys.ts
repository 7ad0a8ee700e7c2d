/** A key press as react-native-web hands it to `onKeyDown` (a React keyboard event), or as a test fires it. */
export type KeyPress = { key: string; repeat?: boolean; preventDefault?: () => void };

const ACTIVATE = new Set([' ', 'Spacebar', 'Enter']);

/** Space and Enter activate a control once per press (a held key does not repeat it). */
export function onActivateKeys(activate: () => void) {
  return (event: KeyPress) => {
    if (!ACTIVATE.has(event.key)) return;
    event.preventDefault?.(); // Space would scroll the page
    if (!event.repeat) activate();
  };
}

/**
 * An `onPress` for a control that also has onActivateKeys: react-native-web fires `onPress` for Enter on
 * key-up as well, and that press is dropped so the control does not act twice; clicks and taps go through.
 */
export function pressIgnoringKeys(activate: () => void) {
  return (event?: unknown) => {
    if (!isKeyEvent(event)) activate();
  };
}

/** Web-only props for a View or Pressable: React Native's types do not list `onKeyDown`; react-native-web passes it to the DOM. */
export function webProps(props: { onKeyDown?: (event: KeyPress) => void }): object {
  return props;
}

/** Arrow keys as a step within a group: −1, +1, or null for any other key. Home and End jump to the ends. */
export function arrowStep(key: string): -1 | 1 | 'first' | 'last' | null {
  if (key === 'ArrowRight' || key === 'ArrowDown') return 1;
  if (key === 'ArrowLeft' || key === 'ArrowUp') return -1;
  if (key === 'Home') return 'first';
  if (key === 'End') return 'last';
  return null;
}

function isKeyEvent(event: unknown): boolean {
  if (event === null || typeof event !== 'object') return false;
  const native = (event as { nativeEvent?: unknown }).nativeEvent ?? event;
  return typeof native === 'object' && native !== null && 'key' in native && typeof (native as { key: unknown }).key === 'string';
}
