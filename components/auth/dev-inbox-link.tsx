import { DEV_INBOX_PATH, env } from '../env';
import { ServerPageLink } from '../ui/text-link';

/** The local test inbox, for reading the mails this server sent; shown only in development builds. */
export function DevInboxLink() {
  if (!env.showDevInbox) return null;
  return (
    <ServerPageLink path={DEV_INBOX_PATH} label="Open the local test inbox" hint="Opens the development mail inbox of the local server" />
  );
}
