import sharp from 'sharp';

export type DemoPhotoKind = 'sill-rot' | 'frass' | 'exit-holes' | 'sound-ash' | 'roof-rail';

const WIDTH = 1200;
const HEIGHT = 900;
/** Pixels per millimetre of the invented "photo", so that holes and the scale bar agree. */
const PX_PER_MM = 4;

type Rng = () => number;

/** mulberry32: a tiny seeded generator, so the same seed always draws the same picture. */
function seededRng(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const between = (rng: Rng, lo: number, hi: number) => lo + rng() * (hi - lo);
const f1 = (n: number) => n.toFixed(1);

type Knot = { x: number; y: number; r: number };
type Palette = { base: string; light: string; dark: string; fibre: number };

const OAK: Palette = { base: '#a97b4c', light: '#c99c68', dark: '#6e4827', fibre: 0.35 };
const ASH: Palette = { base: '#dcc59c', light: '#efdfbf', dark: '#a98a5e', fibre: 0.25 };

/** Wavy grain lines that bend around knots, over a streaky fibre texture. */
function woodGrain(
  rng: Rng,
  p: Palette,
  band: { y0: number; y1: number },
  knots: Knot[],
  id: string,
): string {
  const box = `x="0" y="${band.y0}" width="${WIDTH}" height="${band.y1 - band.y0}"`;
  const parts: string[] = [
    `<clipPath id="band-${id}"><rect ${box}/></clipPath><g clip-path="url(#band-${id})">`,
    `<rect ${box} fill="${p.base}"/>`,
    `<rect ${box} filter="url(#fibre-${id})" opacity="${p.fibre}"/>`,
  ];
  const phase = between(rng, 0, Math.PI * 2);
  const freq = between(rng, 0.002, 0.005);
  for (let y = band.y0 - 20; y < band.y1 + 20; y += between(rng, 6, 16)) {
    const amplitude = between(rng, 4, 14);
    const points: string[] = [];
    for (let x = -20; x <= WIDTH + 20; x += 30) {
      let dy = amplitude * Math.sin(x * freq + phase + y * 0.01);
      for (const k of knots) {
        const dx = x - k.x;
        const dist = y - k.y;
        // Fibres part around a knot: push the line away from its centre, fading with distance.
        dy +=
          Math.sign(dist || 1) *
          k.r *
          1.6 *
          Math.exp(-(dx * dx) / (k.r * k.r * 9) - (dist * dist) / (k.r * k.r * 4));
      }
      points.push(`${x},${f1(y + dy)}`);
    }
    const colour = rng() < 0.7 ? p.dark : p.light;
    parts.push(
      `<polyline points="${points.join(' ')}" fill="none" stroke="${colour}" stroke-width="${f1(between(rng, 0.8, 3.5))}" opacity="${f1(between(rng, 0.25, 0.6))}"/>`,
    );
  }
  for (const k of knots) {
    for (let ring = k.r; ring > 2; ring -= between(rng, 3, 6)) {
      parts.push(
        `<ellipse cx="${f1(k.x)}" cy="${f1(k.y)}" rx="${f1(ring * 1.4)}" ry="${f1(ring)}" fill="none" stroke="${p.dark}" stroke-width="2" opacity="0.55"/>`,
      );
    }
    parts.push(
      `<ellipse cx="${f1(k.x)}" cy="${f1(k.y)}" rx="${f1(k.r * 0.5)}" ry="${f1(k.r * 0.35)}" fill="#4a2d16" opacity="0.8"/>`,
    );
  }
  parts.push('</g>');
  return parts.join('\n');
}

/** An irregular closed outline around a centre, for rot patches and stains. */
function blob(rng: Rng, cx: number, cy: number, rx: number, ry: number, lumps = 18): string {
  const pts: string[] = [];
  for (let i = 0; i < lumps; i++) {
    const a = (i / lumps) * Math.PI * 2;
    const k = between(rng, 0.7, 1.15);
    pts.push(`${f1(cx + Math.cos(a) * rx * k)},${f1(cy + Math.sin(a) * ry * k)}`);
  }
  return pts.join(' ');
}

/** Brown rot: dark shrunken wood broken into cubes by cross-grain cracks, crumbs at the edge. */
function rotPatch(rng: Rng, cx: number, cy: number, rx: number, ry: number, id: string): string {
  const outline = blob(rng, cx, cy, rx, ry);
  // Long cracks follow the grain; short ones cross it between them, which is what makes the cubes.
  const cracks: string[] = [];
  const rows: number[] = [];
  for (let y = cy - ry * 1.2; y < cy + ry * 1.2; y += between(rng, 16, 30)) rows.push(y);
  for (const y of rows) {
    const pts = [];
    for (let x = cx - rx * 1.2; x <= cx + rx * 1.2; x += 20)
      pts.push(`${f1(x)} ${f1(y + between(rng, -3, 3))}`);
    cracks.push(`<path d="M${pts.join(' L')}" stroke-width="${f1(between(rng, 2.5, 5))}"/>`);
  }
  for (let i = 0; i + 1 < rows.length; i++) {
    for (
      let x = cx - rx * 1.2 + between(rng, 0, 20);
      x < cx + rx * 1.2;
      x += between(rng, 14, 34)
    ) {
      const d = `M${f1(x)} ${f1(rows[i])} L${f1(x + between(rng, -4, 4))} ${f1(rows[i + 1])}`;
      cracks.push(`<path d="${d}" stroke-width="${f1(between(rng, 1.5, 3.5))}"/>`);
    }
  }
  const cubes: string[] = [];
  for (let i = 0; i < 30; i++) {
    cubes.push(
      `<rect x="${f1(cx + between(rng, -rx, rx))}" y="${f1(cy + between(rng, -ry, ry))}" width="${f1(between(rng, 8, 22))}" height="${f1(between(rng, 6, 16))}" fill="${rng() < 0.5 ? '#63391b' : '#36200f'}" opacity="0.7"/>`,
    );
  }
  const crumbs: string[] = [];
  for (let i = 0; i < 40; i++) {
    const a = rng() * Math.PI * 2;
    const k = between(rng, 0.95, 1.3);
    crumbs.push(
      `<rect x="${f1(cx + Math.cos(a) * rx * k)}" y="${f1(cy + Math.sin(a) * ry * k)}" width="${f1(between(rng, 2, 6))}" height="${f1(between(rng, 2, 6))}" fill="#3a2312" opacity="0.8"/>`,
    );
  }
  return [
    `<ellipse cx="${cx}" cy="${cy}" rx="${rx * 1.5}" ry="${ry * 1.5}" fill="#3f2a17" opacity="0.35" filter="url(#soft)"/>`,
    `<clipPath id="rot-${id}"><polygon points="${outline}"/></clipPath>`,
    `<polygon points="${outline}" fill="#4a2c15"/>`,
    `<g clip-path="url(#rot-${id})">${cubes.join('')}<g stroke="#1b0d05" fill="none">${cracks.join('')}</g>`,
    `<polygon points="${outline}" fill="none" stroke="#26140a" stroke-width="8" opacity="0.6"/></g>`,
    ...crumbs,
  ].join('\n');
}

/** A round beetle exit hole, slightly stretched along the grain, with a lighter broken rim. */
function exitHole(cx: number, cy: number, diameterMm: number): string {
  const r = (diameterMm * PX_PER_MM) / 2;
  return [
    `<ellipse cx="${f1(cx)}" cy="${f1(cy)}" rx="${f1(r * 1.15 + 1.5)}" ry="${f1(r + 1.5)}" fill="#d7b98c" opacity="0.7"/>`,
    `<ellipse cx="${f1(cx)}" cy="${f1(cy)}" rx="${f1(r * 1.15)}" ry="${f1(r)}" fill="#140a04"/>`,
  ].join('\n');
}

/** A little cone of pale powdery frass below a hole. */
function frassHeap(rng: Rng, cx: number, baseY: number, width: number): string {
  const grains: string[] = [
    `<ellipse cx="${f1(cx)}" cy="${f1(baseY + 4)}" rx="${f1(width * 0.6)}" ry="${f1(width * 0.12)}" fill="#3b2513" opacity="0.35" filter="url(#soft)"/>`,
  ];
  const height = width * 0.45;
  for (let i = 0; i < 140; i++) {
    const u = rng() * 2 - 1;
    const h = rng() * height * (1 - Math.abs(u));
    const shade = ['#efe4c8', '#e3d3ae', '#d6c193', '#f6eedb'][Math.floor(rng() * 4)];
    grains.push(
      `<circle cx="${f1(cx + (u * width) / 2)}" cy="${f1(baseY - h)}" r="${f1(between(rng, 1.2, 3))}" fill="${shade}"/>`,
    );
  }
  return grains.join('\n');
}

/** Stroke glyphs for the scale bar label, so it does not depend on fonts installed on the machine. */
const GLYPHS: Record<string, string> = {
  '0': 'M5 0 Q10 0 10 8 Q10 16 5 16 Q0 16 0 8 Q0 0 5 0 Z',
  '1': 'M2 3 L6 0 L6 16',
  '2': 'M0 3 Q2 0 5 0 Q10 0 10 4.5 Q10 8 0 16 L10 16',
  '5': 'M9 0 L1 0 L0.5 7 Q2.5 6 5 6 Q10 6 10 11 Q10 16 5 16 Q1.5 16 0 14',
  m: 'M0 16 L0 7 M0 9 Q1 7 3 7 Q5 7 5 9 L5 16 M5 9 Q6 7 8 7 Q10 7 10 9 L10 16',
  ' ': '',
};

function label(text: string, x: number, y: number, scale: number): string {
  const d = [...text]
    .map((ch, i) =>
      GLYPHS[ch]
        ? `<path transform="translate(${f1(x + i * 14 * scale)} ${f1(y)}) scale(${scale})" d="${GLYPHS[ch]}"/>`
        : '',
    )
    .join('');
  return `<g fill="none" stroke="#111" stroke-width="${f1(2 / scale)}" stroke-linecap="round" stroke-linejoin="round">${d}</g>`;
}

/** A 50 mm bar in 10 mm steps on a pale card, as a surveyor lays beside the defect. */
function scaleBar(x: number, y: number): string {
  const step = 10 * PX_PER_MM;
  const segments = Array.from(
    { length: 5 },
    (_, i) =>
      `<rect x="${x + 16 + i * step}" y="${y + 16}" width="${step}" height="14" fill="${i % 2 ? '#fafafa' : '#111'}" stroke="#111" stroke-width="1.5"/>`,
  );
  return [
    `<rect x="${x}" y="${y}" width="${5 * step + 32}" height="62" rx="4" fill="#f3f1ea" opacity="0.92"/>`,
    ...segments,
    label('50 mm', x + 16, y + 38, 1),
  ].join('\n');
}

function defs(seed: number, ids: string[]): string {
  const fibre = ids
    .map(
      (id, i) => `<filter id="fibre-${id}" x="0" y="0" width="100%" height="100%">
  <feTurbulence type="fractalNoise" baseFrequency="0.003 0.22" numOctaves="3" seed="${(seed + i) % 1000}"/>
  <feColorMatrix type="matrix" values="0 0 0 0 0.25  0 0 0 0 0.14  0 0 0 0 0.06  0 0 0 1.6 -0.5"/>
</filter>`,
    )
    .join('\n');
  return `<defs>
${fibre}
<filter id="soft" x="-50%" y="-50%" width="200%" height="200%"><feGaussianBlur stdDeviation="14"/></filter>
<linearGradient id="light" x1="0" y1="0" x2="1" y2="1">
  <stop offset="0" stop-color="#fff" stop-opacity="0.16"/><stop offset="1" stop-color="#000" stop-opacity="0.28"/>
</linearGradient>
</defs>`;
}

function compose(kind: DemoPhotoKind, seed: number): string {
  const rng = seededRng(seed * 7919 + [...kind].reduce((h, c) => h * 31 + c.charCodeAt(0), 0));
  const full = { y0: 0, y1: HEIGHT };
  const knots = (n: number): Knot[] =>
    Array.from({ length: n }, () => ({
      x: between(rng, 150, 1050),
      y: between(rng, 150, 750),
      r: between(rng, 14, 30),
    }));
  const body: string[] = [];
  let ids = ['a'];

  switch (kind) {
    case 'sill-rot': {
      body.push(woodGrain(rng, OAK, full, knots(1), 'a'));
      const patches = 2 + Math.floor(rng() * 2);
      for (let i = 0; i < patches; i++) {
        body.push(
          rotPatch(
            rng,
            between(rng, 250, 950),
            between(rng, 300, 650),
            between(rng, 90, 190),
            between(rng, 60, 130),
            `p${i}`,
          ),
        );
      }
      break;
    }
    case 'frass': {
      body.push(woodGrain(rng, OAK, full, knots(1), 'a'));
      const heaps = 3 + Math.floor(rng() * 3);
      for (let i = 0; i < heaps; i++) {
        const x = 120 + ((i + 0.5) * 960) / heaps + between(rng, -40, 40);
        const holeY = between(rng, 200, 520);
        body.push(exitHole(x, holeY, between(rng, 1.5, 2.5)));
        // Frass sifts out of the hole and piles up on the ledge below it.
        body.push(
          frassHeap(
            rng,
            x + between(rng, -10, 10),
            holeY + between(rng, 90, 200),
            between(rng, 50, 110),
          ),
        );
      }
      break;
    }
    case 'exit-holes': {
      body.push(woodGrain(rng, OAK, full, knots(2), 'a'));
      const holes = 25 + Math.floor(rng() * 30);
      for (let i = 0; i < holes; i++) {
        // Clustered like an infestation, not spread evenly.
        const cx = 600 + (rng() + rng() + rng() - 1.5) * 600;
        const cy = 430 + (rng() + rng() + rng() - 1.5) * 420;
        body.push(exitHole(cx, cy, rng() < 0.8 ? between(rng, 1.2, 2) : between(rng, 3, 5)));
      }
      for (let i = 0; i < 120; i++) {
        body.push(
          `<circle cx="${f1(between(rng, 100, 1100))}" cy="${f1(between(rng, 100, 800))}" r="${f1(between(rng, 0.8, 1.8))}" fill="#efe3c4" opacity="0.8"/>`,
        );
      }
      break;
    }
    case 'sound-ash': {
      body.push(woodGrain(rng, ASH, full, knots(rng() < 0.5 ? 1 : 0), 'a'));
      // Two pin marks from a resistance moisture meter: the only blemish on sound wood.
      const x = between(rng, 400, 800);
      const y = between(rng, 300, 600);
      body.push(exitHole(x, y, 0.8), exitHole(x + 25 * PX_PER_MM, y, 0.8));
      break;
    }
    case 'roof-rail': {
      ids = ['a', 'b'];
      const railTop = between(rng, 330, 400);
      const railBottom = railTop + between(rng, 240, 300);
      const slatX = between(rng, 420, 700);
      body.push(`<rect width="${WIDTH}" height="${HEIGHT}" fill="#2c2621"/>`);
      body.push(`<g>${woodGrain(rng, OAK, { y0: railTop, y1: railBottom }, knots(0), 'a')}</g>`);
      // A roof slat meets the rail from above; its grain runs the other way.
      const slat = woodGrain(rng, ASH, { y0: 0, y1: 170 }, [], 'b');
      body.push(
        `<g transform="translate(${f1(slatX + 85)} 0) rotate(90)"><clipPath id="slat"><rect x="0" y="0" width="${f1(railTop + 20)}" height="170"/></clipPath><g clip-path="url(#slat)">${slat}</g></g>`,
      );
      body.push(
        `<rect x="${f1(slatX - 85)}" y="${f1(railTop - 4)}" width="170" height="8" fill="#1d140c" opacity="0.8"/>`,
      );
      // Water that ran down the slat has stained and softened the rail below the joint.
      body.push(
        `<ellipse cx="${f1(slatX)}" cy="${f1(railTop + 90)}" rx="230" ry="110" fill="#3a2614" opacity="0.55" filter="url(#soft)"/>`,
      );
      body.push(rotPatch(rng, slatX + between(rng, -40, 40), railTop + 70, 110, 50, 'r'));
      for (const dx of [-50, 50]) {
        body.push(
          `<circle cx="${f1(slatX + dx)}" cy="${f1(railTop - 40)}" r="7" fill="#7d7a74" stroke="#8a4a1c" stroke-width="4"/>`,
        );
      }
      break;
    }
  }

  return `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}">
${defs(seed, ids)}
${body.join('\n')}
<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#light)"/>
${scaleBar(40, HEIGHT - 102)}
</svg>`;
}

/** An invented close-up of framing timber for the demo seed: wood grain, the damage motif and a scale bar. */
export async function drawDemoPhoto(kind: DemoPhotoKind, seed: number): Promise<Buffer> {
  return sharp(Buffer.from(compose(kind, seed)))
    .jpeg({ quality: 85, mozjpeg: false })
    .toBuffer();
}
