import nodemailer from 'nodemailer';

export type MailMessage = { to: string; subject: string; text: string; html?: string };

export type Mailer = {
  send(msg: MailMessage): Promise<{ messageId: string }>;
  close(): void;
};

/**
 * Plain SMTP to the loopback sink started by `npm start` and by the tests. The sink offers no TLS, so
 * STARTTLS is not attempted; timeouts are short so a sink that is not running fails a request quickly.
 */
export function createMailer({
  host,
  port,
  from,
}: {
  host: string;
  port: number;
  from: string;
}): Mailer {
  const transporter = nodemailer.createTransport({
    host,
    port,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 15_000,
  });
  return {
    async send({ to, subject, text, html }) {
      const info = await transporter.sendMail({ from, to, subject, text, html });
      return { messageId: info.messageId };
    },
    close() {
      transporter.close();
    },
  };
}
