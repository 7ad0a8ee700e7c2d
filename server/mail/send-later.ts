import type { Logger } from '../lib/logger';
import type { Mailer, OutgoingMail } from './mailer';

/** Sends after the response: a mail outage is logged, never turned into a failed request. */
export function sendLater(mailer: Mailer, logger: Logger, mail: OutgoingMail) {
  mailer.send(mail).catch((error) => logger.error({ err: error, to: mail.to, subject: mail.subject }, 'mail failed'));
}
