import nodemailer from 'nodemailer';
import type { Config } from '../config';

export type OutgoingMail = { to: string; subject: string; text: string };
export type Mailer = { send(mail: OutgoingMail): Promise<void>; close(): void };

export function createMailer(config: Config): Mailer {
  const transport = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: false,
    ignoreTLS: config.SMTP_HOST === '127.0.0.1' || config.SMTP_HOST === 'localhost',
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: config.MAIL_FROM, ...mail });
    },
    close: () => transport.close(),
  };
}
