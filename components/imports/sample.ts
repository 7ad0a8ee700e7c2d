/** How much of a file the preview reads: enough for the header and a few dozen rows. */
export const PREVIEW_BYTES = 64 * 1024;

/**
 * The head of a file, cut at its last complete line so the preview never shows a half row as a
 * problem. A file smaller than the sample goes whole.
 */
export async function previewSample(file: Blob): Promise<Blob> {
  if (file.size <= PREVIEW_BYTES) return file;
  const head = file.slice(0, PREVIEW_BYTES);
  const buffer = new Uint8Array(await head.arrayBuffer());
  const lastNewline = buffer.lastIndexOf(0x0a);
  return lastNewline > 0 ? head.slice(0, lastNewline + 1) : head;
}

/** File kinds the picker offers. */
export const IMPORT_FILE_TYPES = '.csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain';

/** `12.4 MB`, `820 KB`, `312 B`. */
export function formatBytes(bytes: number): string {
  if (bytes >= 1_000_000) return `${(bytes / 1_000_000).toFixed(1)} MB`;
  if (bytes >= 1_000) return `${Math.round(bytes / 1_000)} KB`;
  return `${bytes} B`;
}
