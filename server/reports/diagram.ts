/**
 * The body diagram as vector: one SVG string per view (zone polygons shaded by worst open
 * severity, the number drawn in each affected zone, hatching for 3–4, a dashed outline for
 * zones under treatment), handed to svg-to-pdfkit. Severity is never colour alone.
 */
import SVGtoPDF from 'svg-to-pdfkit';
import {
  getBodyPlan,
  polygonCentroid,
  type BodyPlan,
  type BodyPlanView,
} from '@/shared/body-plans';
import { SEVERITY_LABELS } from '@/shared/schemas/finding';
import { severityFill, severityInk, unloggedFill } from '@/shared/theme/colours';
import {
  BOLD,
  INK,
  MUTED,
  REGULAR,
  SIZE,
  TIMBER_DARK,
  contentWidth,
  ensureSpace,
  left,
  type Doc,
} from './layout';

const HATCH: Record<number, 'single' | 'cross'> = { 3: 'single', 4: 'cross' };

type Pt = [number, number];
const pts = (p: Pt[]) => p.map(([x, y]) => `${x.toFixed(1)},${y.toFixed(1)}`).join(' ');

function area(p: Pt[]): number {
  let a = 0;
  for (let i = 0; i < p.length; i++) {
    const [x1, y1] = p[i];
    const [x2, y2] = p[(i + 1) % p.length];
    a += x1 * y2 - x2 * y1;
  }
  return Math.abs(a / 2);
}

/** Diagonal lines (and the crossing set for 4) clipped to the zone's polygons. */
function hatchLines(
  id: string,
  view: BodyPlanView,
  kind: 'single' | 'cross',
  unit: number,
  ink: string,
) {
  const step = 6 * unit;
  const span = view.width + view.height;
  const lines: string[] = [];
  for (let d = -view.height; d < span; d += step) {
    lines.push(`<line x1="${d}" y1="0" x2="${d + view.height}" y2="${view.height}"/>`);
    if (kind === 'cross')
      lines.push(`<line x1="${d + view.height}" y1="0" x2="${d}" y2="${view.height}"/>`);
  }
  return `<g clip-path="url(#${id})" stroke="${ink}" stroke-opacity="0.55" stroke-width="${1.1 * unit}">${lines.join('')}</g>`;
}

/** One view as an SVG document; `unit` is one PDF point in view units. */
export function viewSvg(
  view: BodyPlanView,
  zoneSeverity: Record<string, number>,
  watched: ReadonlySet<string>,
  unit: number,
): string {
  const byZone = new Map<string, Pt[][]>();
  for (const s of view.shapes)
    byZone.set(s.zone, [...(byZone.get(s.zone) ?? []), s.points as Pt[]]);
  const defs: string[] = [];
  const body: string[] = [];
  const marks: string[] = [];
  for (const o of view.outline) {
    const tag = o.closed ? 'polygon' : 'polyline';
    body.push(
      `<${tag} points="${pts(o.points as Pt[])}" fill="none" stroke="${MUTED}" stroke-width="${unit}"/>`,
    );
  }
  let n = 0;
  for (const [zone, polygons] of byZone) {
    const sev = zoneSeverity[zone];
    const logged = typeof sev === 'number' && sev >= 1;
    const fill = logged ? severityFill[sev] : unloggedFill;
    for (const p of polygons)
      body.push(
        `<polygon points="${pts(p)}" fill="${fill}" stroke="${TIMBER_DARK}" stroke-width="${0.8 * unit}" stroke-linejoin="round"/>`,
      );
    if (logged && HATCH[sev]) {
      const id = `clip-${view.key}-${n++}`;
      defs.push(
        `<clipPath id="${id}">${polygons.map((p) => `<polygon points="${pts(p)}"/>`).join('')}</clipPath>`,
      );
      body.push(hatchLines(id, view, HATCH[sev], unit, severityInk[sev] === INK ? INK : '#3A1410'));
    }
    if (watched.has(zone))
      for (const p of polygons)
        body.push(
          `<polygon points="${pts(p)}" fill="none" stroke="${INK}" stroke-width="${1.6 * unit}" stroke-dasharray="${4 * unit} ${2.5 * unit}"/>`,
        );
    if (logged) {
      const largest = polygons.reduce((a, b) => (area(b) > area(a) ? b : a));
      const [cx, cy] = polygonCentroid(largest);
      const r = 6 * unit;
      marks.push(
        `<circle cx="${cx}" cy="${cy}" r="${r}" fill="${severityFill[sev]}" stroke="${INK}" stroke-width="${0.7 * unit}"/>`,
        `<text x="${cx}" y="${cy + 3.2 * unit}" text-anchor="middle" font-family="Atkinson" font-weight="bold" font-size="${9 * unit}" fill="${severityInk[sev]}">${sev}</text>`,
      );
    }
  }
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${view.width} ${view.height}" width="${view.width}" height="${view.height}">` +
    `<defs>${defs.join('')}</defs>${body.join('')}${marks.join('')}</svg>`
  );
}

const fontCallback = (_family: string, bold: boolean) => (bold ? BOLD : REGULAR);

function drawSvg(doc: Doc, svg: string, x: number, y: number, width: number, height: number) {
  SVGtoPDF(doc as never, svg, x, y, {
    width,
    height,
    preserveAspectRatio: 'xMidYMid meet',
    fontCallback,
    assumePt: false,
  });
}

/** The legend: swatch with number and hatch for each level, plus nothing logged and treatment. */
function legendSvg(): { svg: string; width: number; height: number } {
  const items: string[] = [];
  const entries: { sev: number | 'none' | 'watched'; label: string }[] = [
    ...[1, 2, 3, 4].map((s) => ({ sev: s, label: `${s} ${SEVERITY_LABELS[s].title}` })),
    { sev: 'none', label: 'Sound or not logged' },
    { sev: 'watched', label: 'Treated or watched' },
  ];
  let x = 0;
  entries.forEach((e, i) => {
    const text = `<text x="${x + 26}" y="10.5" font-family="Atkinson" font-size="8" fill="${INK}">${e.label}</text>`;
    if (e.sev === 'watched')
      items.push(
        `<rect x="${x}" y="1" width="22" height="12" fill="none" stroke="${INK}" stroke-width="1.2" stroke-dasharray="3 2"/>`,
      );
    else {
      const fill = e.sev === 'none' ? unloggedFill : severityFill[e.sev];
      items.push(
        `<rect x="${x}" y="0" width="22" height="14" rx="2" fill="${fill}" stroke="${TIMBER_DARK}" stroke-width="0.6"/>`,
      );
      if (typeof e.sev === 'number' && HATCH[e.sev]) {
        const cross = HATCH[e.sev] === 'cross';
        items.push(
          `<clipPath id="lg${i}"><rect x="${x}" y="0" width="22" height="14"/></clipPath>`,
        );
        const lines = [-14, -8, -2, 4, 10, 16, 22].map(
          (d) =>
            `<line x1="${x + d}" y1="0" x2="${x + d + 14}" y2="14"/>` +
            (cross ? `<line x1="${x + d + 14}" y1="0" x2="${x + d}" y2="14"/>` : ''),
        );
        items.push(
          `<g clip-path="url(#lg${i})" stroke="#3A1410" stroke-opacity="0.55" stroke-width="0.9">${lines.join('')}</g>`,
        );
      }
      if (typeof e.sev === 'number')
        items.push(
          `<text x="${x + 11}" y="10.5" text-anchor="middle" font-family="Atkinson" font-weight="bold" font-size="9" fill="${severityInk[e.sev]}">${e.sev}</text>`,
        );
    }
    items.push(text);
    // Roughly the label's width at 8 pt in this face, plus the swatch and a gap.
    x += 26 + e.label.length * 4.3 + 14;
  });
  const width = x;
  return {
    svg: `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} 16" width="${width}" height="16">${items.join('')}</svg>`,
    width,
    height: 16,
  };
}

export interface DiagramOptions {
  /** Share of the content width the two-column grid of views takes (1 = full width). */
  scale?: number;
  watched?: string[];
}

/** Every view of the plan in a two-column grid, titled, then the legend. */
export function drawBodyDiagram(
  doc: Doc,
  bodyPlanKey: string,
  zoneSeverity: Record<string, number>,
  opts: DiagramOptions = {},
) {
  const plan: BodyPlan | undefined = getBodyPlan(bodyPlanKey);
  if (!plan) return;
  const totalWidth = contentWidth(doc) * (opts.scale ?? 1);
  const gap = 12;
  const cellW = (totalWidth - gap) / 2;
  // A narrower grid is centred on the page.
  const x0 = left(doc) + (contentWidth(doc) - totalWidth) / 2;
  const watched = new Set(opts.watched ?? []);
  for (let i = 0; i < plan.views.length; i += 2) {
    const row = plan.views.slice(i, i + 2);
    const cellH = Math.max(...row.map((v) => (cellW * v.height) / v.width));
    ensureSpace(doc, cellH + 18);
    const y = doc.y;
    row.forEach((view, j) => {
      const x = x0 + j * (cellW + gap);
      const w = Math.min(cellW, (cellH * view.width) / view.height);
      doc
        .font(BOLD)
        .fontSize(SIZE.small)
        .fillColor(MUTED)
        .text(view.title, x, y, { width: cellW, height: 10, ellipsis: true });
      drawSvg(
        doc,
        viewSvg(view, zoneSeverity, watched, view.width / w),
        x,
        y + 12,
        w,
        (w * view.height) / view.width,
      );
    });
    doc.x = left(doc);
    doc.y = y + 12 + cellH + 6;
  }
  const legend = legendSvg();
  const lw = Math.min(contentWidth(doc), legend.width);
  ensureSpace(doc, 24);
  drawSvg(doc, legend.svg, left(doc), doc.y + 2, lw, (lw * legend.height) / legend.width);
  doc.y += (lw * legend.height) / legend.width + 10;
  doc.x = left(doc);
  doc.font(REGULAR).fontSize(SIZE.body).fillColor(INK);
}
