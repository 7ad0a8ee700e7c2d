import { Platform } from 'react-native';

import { IMPORT_FILE_TYPES } from './sample';

/**
 * Opens the browser's file picker for one reports file (CSV, TSV or text). Resolves with the file, or
 * null when the picker is closed without a choice or there is no browser (tests, native).
 */
export function pickReportsFile(): Promise<File | null> {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return Promise.resolve(null);
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = IMPORT_FILE_TYPES;
    input.style.display = 'none';
    const done = (file: File | null) => {
      input.remove();
      resolve(file);
    };
    input.addEventListener('change', () => done(input.files?.[0] ?? null));
    input.addEventListener('cancel', () => done(null));
    document.body.appendChild(input);
    input.click();
  });
}
