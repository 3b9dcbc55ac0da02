import { promises as fs } from 'node:fs';
import path from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import type { OutboxMessage } from '@/shared/schemas/workshop';

const MESSAGE_FILE = /^(\d{13})-[0-9a-f]+\.eml$/;
const URL_IN_TEXT = /https?:\/\/[^\s<>"'`]+/g;
const HREF = /href\s*=\s*["']([^"']+)["']/gi;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = value === undefined ? [] : Array.isArray(value) ? value : [value];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

/** Links in the order they appear, text part first, without the punctuation that ends a sentence. */
export function extractLinks(text: string, html: string): string[] {
  const fromText = [...text.matchAll(URL_IN_TEXT)].map((m) => m[0].replace(/[.,;:!?)\]]+$/, ''));
  const fromHtml = [...html.matchAll(HREF)]
    .map((m) => m[1].replace(/&amp;/g, '&'))
    .filter((u) => /^https?:\/\//.test(u));
  return [...new Set([...fromText, ...fromHtml])];
}

async function readMessage(dir: string, file: string, receivedAt: Date): Promise<OutboxMessage> {
  const parsed = await simpleParser(await fs.readFile(path.join(dir, file)));
  const text = parsed.text ?? '';
  const html = typeof parsed.html === 'string' ? parsed.html : '';
  const deliveredTo = parsed.headerLines
    .filter((h) => h.key === 'delivered-to')
    .map((h) => h.line.slice(h.line.indexOf(':') + 1).trim());
  return {
    id: file.replace(/\.eml$/, ''),
    receivedAt: receivedAt.toISOString(),
    from: parsed.from?.text ?? '',
    to: deliveredTo.length > 0 ? deliveredTo : addresses(parsed.to),
    subject: parsed.subject ?? '',
    text,
    links: extractLinks(text, html),
  };
}

/** Messages the mail sink kept in `dir`, newest first; a folder that does not exist yet holds none. */
export async function readOutbox(
  dir: string,
  { limit = 100 }: { limit?: number } = {},
): Promise<OutboxMessage[]> {
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw err;
  }
  const newest = names
    .filter((n) => MESSAGE_FILE.test(n))
    .sort()
    .reverse()
    .slice(0, limit);
  return Promise.all(
    newest.map((n) => readMessage(dir, n, new Date(Number(MESSAGE_FILE.exec(n)![1])))),
  );
}

/** Polls the outbox until a message matches, for tests that trigger mail and then read it. */
export async function waitForMail(
  dir: string,
  predicate: (m: OutboxMessage) => boolean,
  timeoutMs = 5_000,
): Promise<OutboxMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await readOutbox(dir)).find(predicate);
    if (found) return found;
    if (Date.now() >= deadline)
      throw new Error(`No matching mail arrived in ${dir} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
