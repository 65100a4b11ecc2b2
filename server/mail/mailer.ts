import nodemailer, { type Transporter } from 'nodemailer';
import type { Db } from '../db';

export type MailInput = { to: string; subject: string; text: string; html: string; links: string[] };
export type Mailer = { send: (message: MailInput) => Promise<void>; kind: 'outbox' | 'smtp' };

/**
 * A nodemailer transport that keeps every message in the database instead of sending it:
 * the local stand-in for a mail server in development and tests (the outbox).
 */
function outboxTransport(db: Db) {
  return {
    name: 'junctura-outbox',
    version: '1',
    send(mail: { data: { to?: unknown; subject?: string; text?: unknown; html?: unknown; links?: string[] } }, done: (err: Error | null, info?: unknown) => void) {
      const { data } = mail;
      db.models.MailMessage.create({
        to: String(data.to ?? ''),
        subject: data.subject ?? '',
        text: String(data.text ?? ''),
        html: String(data.html ?? ''),
        links: data.links ?? [],
      })
        .then((row) => done(null, { messageId: `outbox-${row.id}`, envelope: { to: [data.to] } }))
        .catch((err: Error) => done(err));
    },
  };
}

/** SMTP when SMTP_URL is set; otherwise the outbox. Callers never know which. */
export function createMailer(db: Db, options: { smtpUrl?: string; from: string }): Mailer {
  const transporter: Transporter = options.smtpUrl
    ? nodemailer.createTransport(options.smtpUrl)
    : nodemailer.createTransport(outboxTransport(db) as unknown as Parameters<typeof nodemailer.createTransport>[0]);
  return {
    kind: options.smtpUrl ? 'smtp' : 'outbox',
    async send(message) {
      await transporter.sendMail({ from: options.from, ...message } as Parameters<Transporter['sendMail']>[0]);
    },
  };
}
