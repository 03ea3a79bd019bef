import nodemailer from "nodemailer";

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  /** Hands the message to the SMTP server; resolves once the server accepted it. */
  send(message: MailMessage): Promise<void>;
  close(): void;
}

export interface MailerOptions {
  host: string;
  port: number;
  /** Sender, e.g. "Equilibrist <no-reply@equilibrist.local>". */
  from: string;
}

/**
 * Nodemailer SMTP transport to host:port without TLS (`ignoreTLS`): in development and tests
 * the server is the loopback fake of fake-smtp.ts; in production point SMTP_HOST at a relay.
 */
export function createMailer(options: MailerOptions): Mailer {
  const transport = nodemailer.createTransport({
    host: options.host,
    port: options.port,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return {
    async send(message) {
      await transport.sendMail({ from: options.from, ...message });
    },
    close() {
      transport.close();
    },
  };
}
