import type { z } from 'zod';

import type { stationInput } from '@/shared/schemas';

export type StationDraft = Partial<z.input<typeof stationInput>>;

/**
 * What was typed into "Add a station" while its owner went to register a unit first. Kept for the browser tab (in memory, and in
 * sessionStorage on the web so a reload keeps it too) and handed back once.
 */
const KEY = 'faintline.stationDraft';
let kept: StationDraft | null = null;

function webStorage(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.sessionStorage ? window.sessionStorage : null;
  } catch {
    return null;
  }
}

export function keepStationDraft(draft: StationDraft) {
  kept = draft;
  webStorage()?.setItem(KEY, JSON.stringify(draft));
}

/** The kept draft, once: later calls get null. */
export function takeStationDraft(): StationDraft | null {
  const storage = webStorage();
  let draft = kept;
  if (!draft && storage) {
    try {
      draft = JSON.parse(storage.getItem(KEY) ?? 'null') as StationDraft | null;
    } catch {
      draft = null;
    }
  }
  kept = null;
  storage?.removeItem(KEY);
  return draft;
}
