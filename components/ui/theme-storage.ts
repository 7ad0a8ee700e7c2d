import type { ThemePreference } from './theme';

const KEY = 'faintline.theme';

function storage(): Storage | null {
  try {
    return typeof globalThis.localStorage === 'undefined' ? null : globalThis.localStorage;
  } catch {
    return null; // storage can be blocked (private mode, sandboxed frames)
  }
}

export function readThemePreference(): ThemePreference {
  const value = storage()?.getItem(KEY);
  return value === 'light' || value === 'dark' ? value : 'system';
}

export function writeThemePreference(preference: ThemePreference) {
  const store = storage();
  if (!store) return;
  try {
    if (preference === 'system') store.removeItem(KEY);
    else store.setItem(KEY, preference);
  } catch {
    // quota or privacy errors: the choice still holds for this visit
  }
}
