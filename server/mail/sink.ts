import { randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

/** Invitations are small; anything bigger is refused rather than written to disk. */
export const MAIL_SINK_MAX_BYTES = 2 * 1024 * 1024;

export type MailSink = { port: number; close(): Promise<void> };

/** Sortable by name: the millisecond time first, then randomness so two messages in one ms do not collide. */
export const messageFileName = (at: Date) =>
  `${String(at.getTime()).padStart(13, '0')}-${randomBytes(6).toString('hex')}.eml`;

/**
 * A local SMTP server that keeps every message it accepts as `<dir>/<time>-<random>.eml` and delivers
 * nothing. It listens on loopback only and has no authentication and no TLS.
 */
export async function startMailSink({
  host = '127.0.0.1',
  port = 0,
  dir,
}: {
  host?: string;
  port?: number;
  dir: string;
}): Promise<MailSink> {
  await fs.mkdir(dir, { recursive: true });

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAIL_SINK_MAX_BYTES,
    rejectOversized: true,
    logger: false,
    socketTimeout: 30_000,
    closeTimeout: 2_000,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(
            Object.assign(new Error('Message exceeds fixed maximum message size'), {
              responseCode: 552,
            }),
          );
          return;
        }
        // Record the envelope the way a delivery agent does, so readers see who it was really sent to.
        const envelope = [
          `Return-Path: <${session.envelope.mailFrom ? session.envelope.mailFrom.address : ''}>`,
          ...session.envelope.rcptTo.map((r) => `Delivered-To: ${r.address}`),
        ].join('\r\n');
        const file = path.join(dir, messageFileName(new Date()));
        const temp = path.join(dir, `.${path.basename(file)}.tmp`);
        fs.writeFile(temp, Buffer.concat([Buffer.from(`${envelope}\r\n`), ...chunks]))
          .then(() => fs.rename(temp, file))
          .then(
            () => callback(null, 'Kept in the local outbox'),
            async (err: Error) => {
              await fs.rm(temp, { force: true });
              callback(err);
            },
          );
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  // Errors after start-up (a client dropping mid-message) must not crash the process that hosts the sink.
  server.on('error', () => undefined);

  return {
    port: (server.server.address() as AddressInfo).port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
