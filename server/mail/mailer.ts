import nodemailer from 'nodemailer';

/** One message: plain text, one recipient. */
export type MailMessage = { to: string; subject: string; text: string };

/** Sends mail; `send` resolves when the SMTP server accepted the message. */
export type Mailer = { from: string; send: (message: MailMessage) => Promise<void>; close: () => void };

/** A mailer over SMTP: SMTP_URL in production, or the local fake server (smtp://127.0.0.1:port). */
export function createMailer(smtpUrl: string, from: string): Mailer {
  // The local fake server offers no STARTTLS, so nodemailer talks plain SMTP to it.
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    from,
    send: async (message) => {
      await transport.sendMail({ from, to: message.to, subject: message.subject, text: message.text });
    },
    close: () => transport.close(),
  };
}
