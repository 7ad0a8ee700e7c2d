// Rendered with react-dom into jsdom (not the native test renderer) so real browser focus can be checked.
import { act, useState } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { Pressable, Text } from 'react-native';

import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { AppThemeProvider } from '@/components/ui/theme-provider';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

function Harness({ onConfirm = () => undefined }: { onConfirm?: () => void }) {
  const [open, setOpen] = useState(false);
  return (
    <AppThemeProvider initialPreference="light">
      <Pressable accessibilityRole="button" accessibilityLabel="Delete schedule" onPress={() => setOpen(true)}>
        <Text>Delete schedule</Text>
      </Pressable>
      <ConfirmDialog
        visible={open}
        title="Delete the schedule?"
        message="The station stops sending."
        details={['Its next transmissions are dropped']}
        confirmLabel="Delete schedule"
        destructive
        onConfirm={onConfirm}
        onCancel={() => setOpen(false)}
      />
    </AppThemeProvider>
  );
}

let root: Root;
let host: HTMLDivElement;

beforeEach(() => {
  host = document.createElement('div');
  document.body.appendChild(host);
  root = createRoot(host);
  act(() => root.render(<Harness />));
});

afterEach(() => {
  act(() => root.unmount());
  host.remove();
});

const opener = () => host.querySelector<HTMLElement>('[aria-label="Delete schedule"]')!;
const dialog = () => document.querySelector<HTMLElement>('[role="alertdialog"]');
const inDialog = (label: string) => dialog()!.querySelector<HTMLElement>(`[aria-label="${label}"]`)!;

function open() {
  act(() => opener().focus());
  act(() => opener().click());
}

function key(target: EventTarget, name: string, type: 'keydown' | 'keyup', shiftKey = false) {
  const event = new KeyboardEvent(type, { key: name, shiftKey, bubbles: true, cancelable: true });
  act(() => {
    target.dispatchEvent(event);
  });
  return event;
}

/** What a browser does with Tab when no handler stopped it: focus the next control in document order. */
function tab(shiftKey = false) {
  const event = key(document.activeElement ?? document.body, 'Tab', 'keydown', shiftKey);
  if (event.defaultPrevented) return;
  const all = Array.from(document.querySelectorAll<HTMLElement>('[tabindex="0"], button, input'));
  const at = all.indexOf(document.activeElement as HTMLElement);
  act(() => all[(at + (shiftKey ? -1 : 1) + all.length) % all.length]?.focus());
}

describe('ConfirmDialog focus', () => {
  it('renders outside the screen, over the whole window, and lists what goes with the action', () => {
    open();
    expect(dialog()).not.toBeNull();
    expect(host.contains(dialog())).toBe(false);
    expect(dialog()!.textContent).toContain('Its next transmissions are dropped');
  });

  it('moves focus into the dialog when it opens', () => {
    open();
    expect(dialog()!.contains(document.activeElement)).toBe(true);
    expect(document.activeElement).toBe(inDialog('Cancel'));
  });

  it('keeps Tab and Shift+Tab inside the dialog', () => {
    open();
    const seen = new Set<Element | null>();
    for (let i = 0; i < 5; i += 1) {
      tab();
      seen.add(document.activeElement);
      expect(dialog()!.contains(document.activeElement)).toBe(true);
    }
    expect(seen.has(inDialog('Cancel'))).toBe(true);
    expect(seen.has(inDialog('Delete schedule'))).toBe(true);
    for (let i = 0; i < 5; i += 1) {
      tab(true);
      expect(dialog()!.contains(document.activeElement)).toBe(true);
    }
  });

  it('closes on Escape and gives focus back to the opener', () => {
    open();
    tab();
    key(document.activeElement!, 'Escape', 'keydown');
    key(document.activeElement!, 'Escape', 'keyup');
    expect(dialog()).toBeNull();
    expect(document.activeElement).toBe(opener());
  });

  it('gives focus back to the opener when cancelled with the button', () => {
    open();
    act(() => inDialog('Cancel').click());
    expect(dialog()).toBeNull();
    expect(document.activeElement).toBe(opener());
  });
});
