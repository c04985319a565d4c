/** Outgoing mail through nodemailer: the shop's SMTP server in production, the local outbox otherwise. */
import { createTransport } from 'nodemailer';
import { SmtpSettings } from '../env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export function createMailer(smtp: SmtpSettings | undefined, from: string): Mailer {
  if (!smtp) {
    return {
      send: () => Promise.reject(new Error('No SMTP server is configured: set SMTP_URL, or SMTP_HOST and friends.')),
      close: () => {},
    };
  }
  const transport = createTransport(
    'url' in smtp
      ? smtp.url
      : { host: smtp.host, port: smtp.port, secure: smtp.secure, auth: smtp.user ? { user: smtp.user, pass: smtp.pass } : undefined },
  );
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}
