import { promises as fs } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { extractLinks, readOutbox, waitForMail } from '@/server/mail/outbox';
import { MAIL_SINK_MAX_BYTES, startMailSink, type MailSink } from '@/server/mail/sink';
import { createMailer, type Mailer } from '@/server/mail/transport';

describe('mail through the local sink', () => {
  let dir: string;
  let sink: MailSink;
  let mailer: Mailer;

  beforeAll(async () => {
    dir = path.join(await fs.mkdtemp(path.join(os.tmpdir(), 'sf-mail-')), 'outbox');
    sink = await startMailSink({ dir });
    mailer = createMailer({
      host: '127.0.0.1',
      port: sink.port,
      from: 'Soundframe <no-reply@soundframe.test>',
    });
  });
  afterAll(async () => {
    mailer?.close();
    await sink?.close();
    await fs.rm(path.dirname(dir), { recursive: true, force: true });
  });

  it('reads a folder that does not exist yet as an empty outbox', async () => {
    expect(await readOutbox(path.join(dir, 'never-created'))).toEqual([]);
  });

  it('keeps a UTF-8 message intact and extracts its link', async () => {
    const link = 'http://127.0.0.1:8080/invitation/3f2c9a7e-token?from=mail&x=1';
    const subject = 'Einladung — Süd workshop ✓';
    const sent = await mailer.send({
      to: 'grete.sued@example.test',
      subject,
      text: `Grüß dich! Accept here: ${link}.\nThe link works for 7 days.`,
      html: `<p>Grüß dich! <a href="${link.replace('&', '&amp;')}">Accept</a></p>`,
    });
    expect(sent.messageId).toMatch(/^<.+>$/);

    const msg = await waitForMail(dir, (m) => m.subject === subject);
    expect(msg.subject).toBe(subject);
    expect(msg.from).toContain('no-reply@soundframe.test');
    expect(msg.to).toEqual(['grete.sued@example.test']);
    expect(msg.text).toContain('Grüß dich!');
    expect(msg.links).toEqual([link]);
    expect(Math.abs(Date.parse(msg.receivedAt) - Date.now())).toBeLessThan(10_000);

    const files = await fs.readdir(dir);
    expect(files).toContain(`${msg.id}.eml`);
    expect(files.every((f) => /^\d{13}-[0-9a-f]{12}\.eml$/.test(f))).toBe(true);
  });

  it('lists newest first and honours the limit', async () => {
    for (const n of [1, 2, 3]) {
      await mailer.send({
        to: `order${n}@example.test`,
        subject: `order ${n}`,
        text: 'no links here',
      });
      await new Promise((r) => setTimeout(r, 5)); // distinct millisecond prefixes
    }
    const all = await readOutbox(dir);
    const order = all.filter((m) => m.subject.startsWith('order ')).map((m) => m.subject);
    expect(order).toEqual(['order 3', 'order 2', 'order 1']);
    expect(all.find((m) => m.subject === 'order 2')?.links).toEqual([]);
    const two = await readOutbox(dir, { limit: 2 });
    expect(two.map((m) => m.subject)).toEqual(['order 3', 'order 2']);
  });

  it('refuses a message over the size limit and stores nothing for it', async () => {
    const before = (await fs.readdir(dir)).length;
    await expect(
      mailer.send({
        to: 'big@example.test',
        subject: 'too big',
        text: 'x'.repeat(MAIL_SINK_MAX_BYTES + 1024),
      }),
    ).rejects.toThrow(/552|size/i);
    expect((await fs.readdir(dir)).length).toBe(before);
    expect((await readOutbox(dir)).some((m) => m.subject === 'too big')).toBe(false);
  });

  it('waitForMail gives up after its timeout', async () => {
    await expect(waitForMail(dir, (m) => m.subject === 'never sent', 200)).rejects.toThrow(
      /within 200 ms/,
    );
  });
});

describe('extractLinks', () => {
  it('takes links from text and html once each, without trailing punctuation', () => {
    expect(
      extractLinks(
        'See https://a.test/x, then (https://b.test/y). Done.',
        '<a href="https://a.test/x">a</a><a href="mailto:z@z.test">z</a><a href=\'https://c.test/?a=1&amp;b=2\'>c</a>',
      ),
    ).toEqual(['https://a.test/x', 'https://b.test/y', 'https://c.test/?a=1&b=2']);
  });
});

describe('createMailer', () => {
  it('fails quickly when no sink is listening', async () => {
    const sink = await startMailSink({
      dir: path.join(os.tmpdir(), `sf-mail-closed-${process.pid}`),
    });
    const port = sink.port;
    await sink.close();
    const mailer = createMailer({ host: '127.0.0.1', port, from: 'a@example.test' });
    const started = Date.now();
    await expect(mailer.send({ to: 'b@example.test', subject: 's', text: 't' })).rejects.toThrow(
      /ECONNREFUSED/,
    );
    expect(Date.now() - started).toBeLessThan(5_000);
    mailer.close();
    await fs.rm(path.join(os.tmpdir(), `sf-mail-closed-${process.pid}`), {
      recursive: true,
      force: true,
    });
  });
});
