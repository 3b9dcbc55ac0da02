import sharp from 'sharp';
import { drawPhotoAppendix } from '@/server/reports/appendix';
import { createDoc, type Doc } from '@/server/reports/layout';
import { renderReport } from '@/server/reports/render';
import { buildReportSnapshot, buildSurvey } from '../factories/report-snapshot';
import { headingLine, pdfImages, pdfInfo, pdfText, textLines } from './support/poppler';

function finish(doc: Doc): Promise<Buffer> {
  return new Promise((resolve) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.end();
  });
}

const jpeg = (w: number, h: number, background: string) =>
  sharp({ create: { width: w, height: h, channels: 3, background } })
    .jpeg()
    .toBuffer();

describe('drawPhotoAppendix', () => {
  it('embeds a photo shown under two zones once, resized to 1000 px, and skips lost ones', async () => {
    const photos: Record<string, Buffer> = {
      a: await jpeg(1600, 1200, '#8a6a40'),
      b: await jpeg(900, 1600, '#4a5a60'),
    };
    const loads: string[] = [];
    const doc = createDoc('A4', {
      title: 't',
      author: 'a',
      subject: 's',
      keywords: 'k',
      reportId: 'SF-0000-0000',
    });
    const stages: string[] = [];
    const count = await drawPhotoAppendix(
      doc,
      [
        { title: 'Left sill', photos: [{ photoId: 'a', caption: 'Sill from below' }] },
        {
          title: 'Left front hinge pillar',
          photos: [
            { photoId: 'a', caption: 'Same photo, second zone' },
            { photoId: 'b', caption: 'Pillar face' },
            { photoId: 'gone', caption: 'Deleted from storage' },
          ],
        },
      ],
      { loadPhoto: async (id) => (loads.push(id), photos[id] ?? null) },
      (_p, stage) => void stages.push(stage),
      { from: 50, to: 90 },
      'Intro',
    );
    const images = pdfImages(await finish(doc));
    expect(count).toBe(2);
    expect(loads.sort()).toEqual(['a', 'b', 'gone']);
    // Drawn three times, stored twice: the repeated draw points at the same image object.
    expect(images).toHaveLength(3);
    expect(new Set(images.map((i) => i.object)).size).toBe(2);
    const sizes = images.map((i) => `${i.width}x${i.height}`);
    expect(sizes).toEqual(['1000x750', '1000x750', '563x1000']);
    expect(stages).toEqual([
      'Embedding photos 1/3',
      'Embedding photos 2/3',
      'Embedding photos 3/3',
    ]);
  });
});

describe('renderReport on a vehicle with nothing found', () => {
  it('keeps every section and says plainly that it is empty', async () => {
    const snapshot = buildReportSnapshot({
      surveys: [
        buildSurvey({ date: '2026-11-02', notAccessibleZones: [], notAccessibleNotes: '' }),
      ],
      settings: { paperSize: 'Letter', units: 'imperial' },
    });
    const noPhotos = { loadPhoto: async () => null };
    const scope = await renderReport(
      snapshot,
      { shortId: 'SF-0000-0001', version: 1 },
      noPhotos,
      () => {},
    );
    const lines = textLines(pdfText(scope.pdf));
    for (const [heading, empty] of [
      ['Structural, must fix', 'No structural items.'],
      ['Cosmetic', 'No cosmetic items.'],
      ['Monitor', 'No zones to monitor.'],
      ['Timber cut list', 'No timber to cut.'],
      ['Order of work', 'No work to order.'],
      ['Treatment history', 'No treatments recorded.'],
      ['Not inspected', 'Every zone of the body plan was reached on a survey.'],
      ['Photographs', 'No photographs were taken of these zones.'],
    ]) {
      const at = headingLine(lines, heading);
      expect(at).toBeGreaterThanOrEqual(0);
      expect(lines.slice(at + 1, at + 4)).toContain(empty);
    }
    expect(scope.photoCount).toBe(0);
    expect(pdfImages(scope.pdf)).toHaveLength(0);
    expect(pdfInfo(scope.pdf).pageSize).toEqual([612, 792]);

    const buyer = await renderReport(
      { ...snapshot, kind: 'condition' },
      { shortId: 'SF-0000-0002', version: 1 },
      noPhotos,
      () => {},
    );
    const text = pdfText(buyer.pdf);
    expect(text).toContain('No structural member was found that must be fixed.');
    expect(text).toContain('No live or recently treated attack was found.');
    expect(buyer.summary.mustFix).toEqual([]);
  });
});
