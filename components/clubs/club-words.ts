import type { ReviewRow } from '@/shared/schemas';

/** `20m` → `20 m`, as the bands are written on screen. */
export function bandLabel(bandId: string): string {
  return bandId.replace(/^(\d+)(c?m)$/, '$1 $2');
}

export type ReviewStatus = ReviewRow['status'];

export const statusWords: Record<ReviewStatus, { short: string; filter: string }> = {
  ok: { short: 'Ready', filter: 'Ready' },
  attention: { short: 'Needs attention', filter: 'Needs attention' },
  suspended: { short: 'Stopped by the club', filter: 'Stopped' },
  off: { short: 'Not sending', filter: 'Not sending' },
};

/** The compliance verdict of one station, as a sentence. */
export function verdictSentence(row: ReviewRow): string {
  const problems = row.findings.length;
  switch (row.status) {
    case 'ok':
      return 'Ready: nothing to fix on the enabled bands.';
    case 'attention':
      return `Needs attention: ${problems === 1 ? 'one thing' : `${problems} things`} to fix before it may send.`;
    case 'suspended':
      return `Stopped by the club${row.suspension ? `: ${row.suspension.reason}` : ''}.`;
    case 'off':
      return problems
        ? `Not sending (transmitting is off), and ${problems === 1 ? 'one thing' : `${problems} things`} to fix first.`
        : 'Not sending: its owner has transmitting switched off.';
  }
}

/** Order for sorting by status: the ones to act on first. */
export const statusRank: Record<ReviewStatus, number> = { attention: 0, suspended: 1, off: 2, ok: 3 };
