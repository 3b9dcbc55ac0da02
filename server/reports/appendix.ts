/**
 * The photographs appendix. Each photo is re-encoded once (≤ 1000 px, JPEG q80: sharp, good
 * enough for print at this size) and opened once as a pdfkit image object, so a photo shown
 * twice is stored in the file once.
 */
import sharp from 'sharp';
import type { RenderDeps, RenderProgress } from './types';
import {
  INK,
  MUTED,
  SIZE,
  SUNKEN,
  contentWidth,
  emptyNote,
  heading,
  left,
  para,
  type Doc,
} from './layout';

export interface AppendixPhoto {
  photoId: string;
  caption: string;
}
export interface AppendixGroup {
  title: string;
  photos: AppendixPhoto[];
}

/** pdfkit's opened image (its typings lack `openImage`; `image()` accepts the object). */
type PdfImage = { width: number; height: number };
const openImage = (doc: Doc, jpeg: Buffer) =>
  (doc as unknown as { openImage(src: Buffer): PdfImage }).openImage(jpeg);

const MAX_SIDE = 1000;
const QUALITY = 80;

export async function preparePhoto(display: Buffer): Promise<Buffer> {
  return sharp(display, { limitInputPixels: 60_000_000 })
    .rotate()
    .resize({ width: MAX_SIDE, height: MAX_SIDE, fit: 'inside', withoutEnlargement: true })
    .jpeg({ quality: QUALITY, mozjpeg: true })
    .toBuffer();
}

/** Draws the appendix; returns the number of distinct photos embedded. */
export async function drawPhotoAppendix(
  doc: Doc,
  groups: AppendixGroup[],
  deps: RenderDeps,
  onProgress: RenderProgress,
  progress: { from: number; to: number },
  intro: string,
): Promise<number> {
  doc.addPage();
  heading(doc, 'Photographs');
  para(doc, intro, { color: MUTED, gap: 0.3 });
  const ids = [...new Set(groups.flatMap((g) => g.photos.map((p) => p.photoId)))];
  if (!ids.length) {
    emptyNote(doc, 'No photographs were taken of these zones.');
    return 0;
  }
  const opened = new Map<string, PdfImage | null>();
  let done = 0;
  const open = async (id: string) => {
    if (opened.has(id)) return opened.get(id)!;
    const display = await deps.loadPhoto(id);
    const image = display ? openImage(doc, await preparePhoto(display)) : null;
    opened.set(id, image);
    done++;
    const share = done / ids.length;
    await onProgress(
      Math.round(progress.from + (progress.to - progress.from) * share),
      `Embedding photos ${done}/${ids.length}`,
    );
    return image;
  };

  const gap = 12;
  const cellW = (contentWidth(doc) - gap) / 2;
  const cellH = cellW * 0.62;
  const captionH = 28;
  for (const g of groups) {
    if (!g.photos.length) continue;
    if (doc.y + 20 + cellH + captionH > doc.page.height - doc.page.margins.bottom) doc.addPage();
    para(doc, g.title, { bold: true, size: SIZE.h3 });
    for (let i = 0; i < g.photos.length; i += 2) {
      if (doc.y + cellH + captionH > doc.page.height - doc.page.margins.bottom) doc.addPage();
      const y = doc.y;
      for (const [j, p] of g.photos.slice(i, i + 2).entries()) {
        const x = left(doc) + j * (cellW + gap);
        const image = await open(p.photoId);
        doc.rect(x, y, cellW, cellH).fillColor(SUNKEN).fill();
        if (image)
          doc.image(image as unknown as Buffer, x, y, {
            fit: [cellW, cellH],
            align: 'center',
            valign: 'center',
          });
        else
          doc
            .fontSize(SIZE.small)
            .fillColor(MUTED)
            .text('This photo is no longer in storage.', x + 8, y + cellH / 2 - 5, {
              width: cellW - 16,
              align: 'center',
            });
        doc
          .fontSize(SIZE.small)
          .fillColor(INK)
          .text(p.caption || 'No caption', x, y + cellH + 3, {
            width: cellW,
            height: captionH - 4,
            ellipsis: true,
          });
      }
      doc.x = left(doc);
      doc.y = y + cellH + captionH;
    }
    doc.moveDown(0.3);
  }
  return [...opened.values()].filter(Boolean).length;
}
