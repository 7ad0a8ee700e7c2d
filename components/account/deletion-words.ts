import type { AccountDeletionPreview } from '@/shared/api/answers';

const things = (n: number, one: string, many: string) => (n === 1 ? `1 ${one}` : `${n} ${many}`);

/** What deleting the account does, item by item, in the words the card shows. */
export function deletionWords(preview: AccountDeletionPreview): string[] {
  const { stations, deviceTokens, units, listeningPosts } = preview;
  const lines = [
    stations === 0
      ? 'You have no stations.'
      : `Your ${stations === 1 ? 'station goes' : `${stations} stations go`}, with schedules, bands, calibration, heartbeats and alerts` +
        (deviceTokens ? `; ${deviceTokens === 1 ? 'its device token stops' : `${deviceTokens} device tokens stop`} working at once.` : '.'),
    units === 0 ? 'You have no units.' : `Your ${units === 1 ? 'unit and its photos go' : `${units} units and their photos go`}.`,
    listeningPosts === 0
      ? 'You have no listening posts.'
      : `Your ${listeningPosts === 1 ? 'listening post goes' : `${listeningPosts} listening posts go`}; their tokens stop working.`,
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

/** The last question's short form: what goes, and that it cannot be undone. */
export function deletionSummary(preview: AccountDeletionPreview | undefined): string {
  if (!preview) return 'Your account and everything in it go. This cannot be undone.';
  const goes = [
    things(preview.stations, 'station', 'stations'),
    things(preview.units, 'unit', 'units'),
    things(preview.listeningPosts, 'listening post', 'listening posts'),
  ].join(', ');
  const clubs = preview.clubs.length ? ` You leave ${things(preview.clubs.length, 'club', 'clubs')}.` : '';
  return `Your account goes with ${goes}.${clubs} Reception reports stay. This cannot be undone.`;
}
