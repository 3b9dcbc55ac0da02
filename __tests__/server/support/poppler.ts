/**
 * Reading PDFs back with Debian's poppler-utils (pdftotext, pdfinfo, pdffonts, pdfimages,
 * pdftoppm), as a reader's viewer would: what the file says, not what the renderer meant.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

function run(tool: string, args: string[]): string {
  return execFileSync(tool, args, { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
}

/** Writes the bytes to a temporary file once per buffer, so each tool reads the same file. */
const files = new WeakMap<Buffer, string>();
export function pdfFile(pdf: Buffer): string {
  let file = files.get(pdf);
  if (!file) {
    file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'sf-pdf-')), 'report.pdf');
    fs.writeFileSync(file, pdf);
    files.set(pdf, file);
  }
  return file;
}

/** The text with its layout kept; `page` limits it to one page (1-based). */
export function pdfText(pdf: Buffer, page?: number): string {
  const range = page ? ['-f', String(page), '-l', String(page)] : [];
  return run('pdftotext', ['-layout', '-enc', 'UTF-8', ...range, pdfFile(pdf), '-']);
}

export interface PdfInfo {
  pages: number;
  /** Page size in points, e.g. [595.28, 841.89] for A4. */
  pageSize: [number, number];
  fields: Record<string, string>;
}

export function pdfInfo(pdf: Buffer): PdfInfo {
  // -custom lists the custom Info keys only, so both listings are read.
  const out = [
    ...run('pdfinfo', [pdfFile(pdf)]).split('\n'),
    ...run('pdfinfo', ['-custom', pdfFile(pdf)]).split('\n'),
  ];
  const fields: Record<string, string> = {};
  for (const line of out) {
    const m = /^([^:]+):\s*(.*)$/.exec(line);
    if (m) fields[m[1].trim()] = m[2].trim();
  }
  const size = /([\d.]+) x ([\d.]+) pts/.exec(fields['Page size'] ?? '');
  return {
    pages: Number(fields.Pages),
    pageSize: size ? [Number(size[1]), Number(size[2])] : [0, 0],
    fields,
  };
}

export interface PdfFont {
  name: string;
  type: string;
  embedded: boolean;
  subset: boolean;
}

/** pdffonts' table: name, type, encoding, emb, sub, uni, object ID. */
export function pdfFonts(pdf: Buffer): PdfFont[] {
  const lines = run('pdffonts', [pdfFile(pdf)])
    .split('\n')
    .slice(2)
    .filter(Boolean);
  return lines.map((line) => {
    const cols = line.trim().split(/\s+/);
    // The last five columns are fixed (emb sub uni object-number generation).
    const [emb, sub] = cols.slice(-5, -3);
    return {
      name: cols[0],
      type: cols.slice(1, -6).join(' '),
      embedded: emb === 'yes',
      subset: sub === 'yes',
    };
  });
}

export interface PdfImage {
  page: number;
  type: string;
  width: number;
  height: number;
  encoding: string;
  object: number;
}

/** pdfimages -list: one row per image drawn; the object number tells repeated draws apart. */
export function pdfImages(pdf: Buffer): PdfImage[] {
  const lines = run('pdfimages', ['-list', pdfFile(pdf)])
    .split('\n')
    .slice(2)
    .filter(Boolean);
  return lines.map((line) => {
    const c = line.trim().split(/\s+/);
    return {
      page: Number(c[0]),
      type: c[2],
      width: Number(c[3]),
      height: Number(c[4]),
      encoding: c[8],
      object: Number(c[10]),
    };
  });
}

/** Renders one page to PNG at `dpi` and returns the file written. */
export function pageToPng(pdf: Buffer, page: number, outBase: string, dpi = 60): string {
  fs.mkdirSync(path.dirname(outBase), { recursive: true });
  run('pdftoppm', [
    '-png',
    '-r',
    String(dpi),
    '-f',
    String(page),
    '-l',
    String(page),
    '-singlefile',
    pdfFile(pdf),
    outBase,
  ]);
  return `${outBase}.png`;
}

/** pdftotext lines, trimmed (page breaks are form feeds, which trim removes). */
export const textLines = (text: string) => text.split('\n').map((l) => l.trim());

/** Index of the first line that is exactly `heading`, at or after `from`; -1 when absent. */
export function headingLine(lines: string[], heading: string, from = 0): number {
  for (let i = from; i < lines.length; i++) if (lines[i] === heading) return i;
  return -1;
}

/**
 * The lines between two headings (exclusive), without page footers; throws when either is
 * missing so a check on the slice cannot pass by accident.
 */
export function section(lines: string[], from: string, to: string, footer?: RegExp): string[] {
  const a = headingLine(lines, from);
  const b = headingLine(lines, to, a + 1);
  if (a < 0 || b < 0) throw new Error(`Headings "${from}" … "${to}" not found in order`);
  return lines.slice(a + 1, b).filter((l) => l && !(footer && footer.test(l)));
}

/** Lines joined with single spaces, so a phrase wrapped over two lines still matches. */
export const flat = (lines: string[]) => lines.join(' ').replace(/\s+/g, ' ');

/** "£1,234.56" or "EUR 12.00" → 1234.56. */
export const moneyValue = (printed: string) => Number(printed.replace(/[^\d.-]/g, ''));
