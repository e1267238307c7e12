import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../env';

export interface Mailer {
  send(message: { to: string; subject: string; text: string; html?: string }): Promise<void>;
  healthy(): Promise<boolean>;
}

export function createMailer(config: Config): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    ignoreTLS: !config.SMTP_SECURE,
    auth: config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD ?? '' } : undefined,
  });
  return {
    async send(message) {
      await transport.sendMail({ from: config.MAIL_FROM, ...message });
    },
    async healthy() {
      try {
        await transport.verify();
        return true;
      } catch {
        return false;
      }
    },
  };
}
