import * as fc from 'fast-check';
import {
  boardFeet,
  inToMm,
  residualSection,
  roughThicknessQuarters,
  scarfLength,
  spliceGeometry,
  surfacedThicknessIn,
  type DecayFaces,
} from '@/shared/wood';
import { fieldOf } from './support/domain-error';

const FACES = ['top', 'bottom', 'left', 'right'] as const;

describe('residualSection', () => {
  it('gives the standard properties of a sound 2×6 (1.5 × 5.5 in)', () => {
    // AWC NDS Supplement, Table 1B (any mechanics text): 1.5 × 5.5 in → A 8.25 in², S 7.5625 in³, I 20.797 in⁴
    const r = residualSection({ width: 1.5, depth: 5.5, decay: {} });
    expect(r.area).toBeCloseTo(8.25, 4);
    expect(r.sectionModulus).toBeCloseTo(7.5625, 4);
    expect(r.momentOfInertia).toBeCloseTo(20.797, 3);
    expect([r.areaRatio, r.sectionModulusRatio, r.momentOfInertiaRatio]).toEqual([1, 1, 1]);
  });

  it('gives the standard properties of a 2×4 (1.5 × 3.5 in)', () => {
    // AWC NDS Supplement, Table 1B (memory for the table; tabulated to 3 decimals):
    // 1.5 × 3.5 in → A 5.25 in², S 3.063 in³, I 5.359 in⁴
    const r = residualSection({ width: 1.5, depth: 3.5, decay: {} });
    const halfLastDigit = 0.0005 + 1e-12;
    expect(Math.abs(r.area - 5.25)).toBeLessThanOrEqual(halfLastDigit);
    expect(Math.abs(r.sectionModulus - 3.063)).toBeLessThanOrEqual(halfLastDigit);
    expect(Math.abs(r.momentOfInertia - 5.359)).toBeLessThanOrEqual(halfLastDigit);
  });

  it('takes decay on the top and bottom off the depth: ratios go as d, d² and d³', () => {
    // 60 × 40 mm with 5 mm of rot on top and 5 mm below: 30 mm of sound depth, 3/4 of 40.
    const r = residualSection({ width: 60, depth: 40, decay: { top: 5, bottom: 5 } });
    expect(r.width).toBe(60);
    expect(r.depth).toBe(30);
    expect(r.area).toBe(1800);
    expect(r.sectionModulus).toBeCloseTo((60 * 30 * 30) / 6, 9);
    expect(r.areaRatio).toBeCloseTo(0.75, 12);
    expect(r.sectionModulusRatio).toBeCloseTo(0.5625, 12);
    expect(r.momentOfInertiaRatio).toBeCloseTo(0.421875, 12);
  });

  it('takes decay on the left and right off the width: all ratios fall alike', () => {
    const r = residualSection({ width: 60, depth: 40, decay: { left: 12, right: 3 } });
    expect(r.width).toBe(45);
    expect(r.depth).toBe(40);
    expect(r.areaRatio).toBeCloseTo(0.75, 12);
    expect(r.sectionModulusRatio).toBeCloseTo(0.75, 12);
    expect(r.momentOfInertiaRatio).toBeCloseTo(0.75, 12);
  });

  it('gives zeros, not negatives, for a member decayed right through', () => {
    const r = residualSection({ width: 60, depth: 40, decay: { top: 30, bottom: 30, left: 5 } });
    expect(r).toEqual({
      width: 55,
      depth: 0,
      area: 0,
      sectionModulus: 0,
      momentOfInertia: 0,
      areaRatio: 0,
      sectionModulusRatio: 0,
      momentOfInertiaRatio: 0,
    });
  });

  const decayArb = fc.record({
    top: fc.double({ min: 0, max: 200, noNaN: true }),
    bottom: fc.double({ min: 0, max: 200, noNaN: true }),
    left: fc.double({ min: 0, max: 200, noNaN: true }),
    right: fc.double({ min: 0, max: 200, noNaN: true }),
  });
  const sizeArb = fc.double({ min: 1, max: 500, noNaN: true });

  it('keeps every ratio within [0, 1] (property)', () => {
    fc.assert(
      fc.property(sizeArb, sizeArb, decayArb, (width, depth, decay) => {
        const r = residualSection({ width, depth, decay });
        for (const ratio of [r.areaRatio, r.sectionModulusRatio, r.momentOfInertiaRatio]) {
          expect(ratio).toBeGreaterThanOrEqual(0);
          expect(ratio).toBeLessThanOrEqual(1);
        }
        expect(r.width).toBeGreaterThanOrEqual(0);
        expect(r.depth).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it('never raises a ratio as any one decay depth grows (property)', () => {
    fc.assert(
      fc.property(
        sizeArb,
        sizeArb,
        decayArb,
        fc.constantFrom(...FACES),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (width, depth, decay, face, extra) => {
          const before = residualSection({ width, depth, decay });
          const more: DecayFaces = { ...decay, [face]: decay[face] + extra };
          const after = residualSection({ width, depth, decay: more });
          expect(after.areaRatio).toBeLessThanOrEqual(before.areaRatio);
          expect(after.sectionModulusRatio).toBeLessThanOrEqual(before.sectionModulusRatio);
          expect(after.momentOfInertiaRatio).toBeLessThanOrEqual(before.momentOfInertiaRatio);
        },
      ),
    );
  });

  it.each([
    ['width', { width: -60, depth: 40, decay: {} }],
    ['width', { width: 0, depth: 40, decay: {} }],
    ['depth', { width: 60, depth: Number.NaN, decay: {} }],
    ['decay.top', { width: 60, depth: 40, decay: { top: -1 } }],
    ['decay.right', { width: 60, depth: 40, decay: { right: Number.POSITIVE_INFINITY } }],
  ])('rejects a bad %s', (field, input) => {
    expect(fieldOf(() => residualSection(input))).toBe(field);
  });
});

describe('boardFeet', () => {
  // SOURCES.md ("Lumber"): BF = T × W × L / 144 in; 1 × 9 × 96 in → 6 BF
  it('1 × 9 × 96 in → 6 BF', () => expect(boardFeet(1, 9, 96)).toBeCloseTo(6, 12));
  // SOURCES.md ("Lumber"): 2 × 6 × 96 in → 8 BF
  it('2 × 6 × 96 in → 8 BF', () => expect(boardFeet(2, 6, 96)).toBeCloseTo(8, 12));
  // SOURCES.md ("Lumber"): stock under 1 in counts as 1 in
  it('counts 3/4 in stock as 1 in', () => expect(boardFeet(0.75, 9, 96)).toBeCloseTo(6, 12));

  const dim = fc.double({ min: 1, max: 200, noNaN: true });
  const factor = fc.double({ min: 1, max: 10, noNaN: true });

  it('scales linearly with each dimension (property; thickness from 1 in up)', () => {
    fc.assert(
      fc.property(dim, dim, dim, factor, fc.integer({ min: 0, max: 2 }), (t, w, l, k, which) => {
        const dims: [number, number, number] = [t, w, l];
        const scaled: [number, number, number] = [t, w, l];
        scaled[which] *= k;
        const ratio = boardFeet(...scaled) / boardFeet(...dims);
        expect(ratio).toBeCloseTo(k, 9);
      }),
    );
  });

  it.each<[string, [number, number, number]]>([
    ['thicknessIn', [-1, 6, 96]],
    ['widthIn', [1, 0, 96]],
    ['lengthIn', [1, 6, Number.NaN]],
  ])('rejects a bad %s', (field, args) => {
    expect(fieldOf(() => boardFeet(...args))).toBe(field);
  });
});

describe('rough thickness in quarters', () => {
  // NHLA rules (memory for the attribution), rough → S2S: 4/4 → 13/16, 5/4 → 1 1/16, 6/4 → 1 5/16,
  // 8/4 → 1 3/4, 10/4 → 2 1/4, 12/4 → 2 3/4, 16/4 → 3 3/4 in
  const table: [number, number][] = [
    [4, 13 / 16],
    [5, 17 / 16],
    [6, 21 / 16],
    [8, 1.75],
    [10, 2.25],
    [12, 2.75],
    [16, 3.75],
  ];

  it.each(table)('%s/4 surfaces to %s in', (q, s2s) => {
    expect(surfacedThicknessIn(q)).toBe(s2s);
    // A finished size of exactly the S2S thickness needs that stock; a hair more needs the next.
    expect(roughThicknessQuarters(s2s)).toBe(q);
  });

  it('chooses the next size up when the finished size is above a standard S2S thickness', () => {
    expect(roughThicknessQuarters(0.82)).toBe(5);
    expect(roughThicknessQuarters(1.76)).toBe(10);
    expect(roughThicknessQuarters(3)).toBe(16);
  });

  it('covers millimetre sizes converted to inches', () => {
    // 19 mm = 0.748 in → 4/4; 32 mm = 1.26 in → 6/4; 45 mm = 1.77 in → 10/4; 55 mm = 2.17 in → 10/4
    expect(roughThicknessQuarters(19 / 25.4)).toBe(4);
    expect(roughThicknessQuarters(32 / 25.4)).toBe(6);
    expect(roughThicknessQuarters(45 / 25.4)).toBe(10);
    expect(roughThicknessQuarters(55 / 25.4)).toBe(10);
  });

  it('refuses more than 16/4 gives, a non-standard quarter, and bad sizes', () => {
    expect(fieldOf(() => roughThicknessQuarters(3.8))).toBe('finishedThicknessIn');
    expect(fieldOf(() => roughThicknessQuarters(0))).toBe('finishedThicknessIn');
    expect(fieldOf(() => roughThicknessQuarters(Number.NaN))).toBe('finishedThicknessIn');
    expect(fieldOf(() => surfacedThicknessIn(7))).toBe('quarters');
  });
});

describe('scarf splices', () => {
  it('25 mm at 1:10 → 250 mm', () => expect(scarfLength(25, 10)).toBe(250));
  it('1 in at 1:12 → 12 in (any unit in, same unit out)', () =>
    expect(scarfLength(1, 12)).toBe(12));

  it('keeps splices three scarf lengths apart (FAA AC 43.13-1B §1-40)', () => {
    expect(spliceGeometry(38, 12)).toEqual({ slope: 12, scarfLengthMm: 456, minSpacingMm: 1368 });
    expect(spliceGeometry(inToMm(1), 10).minSpacingMm).toBeCloseTo(762, 9);
  });

  it('rejects a bad depth or slope', () => {
    expect(fieldOf(() => scarfLength(-25, 10))).toBe('depth');
    expect(fieldOf(() => scarfLength(25, Number.NaN))).toBe('slope');
    expect(fieldOf(() => spliceGeometry(0, 10))).toBe('depthMm');
  });
});
