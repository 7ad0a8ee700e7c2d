import type { AccountDeletionPreview } from '@/shared/api/answers';

const count = (n: number, one: string, many: string) => `${n === 0 ? 'no' : n} ${n === 1 ? one : many}`;

/** What deleting the account does, item by item, in the words the card and the dialog show. */
export function deletionWords(preview: AccountDeletionPreview): string[] {
  const lines = [
    `Your ${count(preview.stations, 'station', 'stations')} go, with their schedules, bands, calibration, heartbeats and alerts` +
      (preview.deviceTokens ? `; ${count(preview.deviceTokens, 'device token stops', 'device tokens stop')} working at once.` : '.'),
    `Your ${count(preview.units, 'unit', 'units')} and their photos go.`,
    `Your ${count(preview.listeningPosts, 'listening post', 'listening posts')} go; their tokens stop working.`,
    'Reception reports stay in the shared record of what was heard, without your name.',
  ];
  for (const club of preview.clubs) {
    if (club.outcome === 'leave') lines.push(`You leave ${club.clubName}; its log records that you left.`);
    if (club.outcome === 'delete-club') lines.push(`${club.clubName} has no other member and is deleted.`);
    if (club.outcome === 'hand-over')
      lines.push(`You are the only admin of ${club.clubName}: make another member an admin there first (Club → Members).`);
  }
  lines.push('Your own change log and notices go; club logs keep their entries. You are signed out everywhere.');
  return lines;
}
