import {
  DEFAULT_WOOD_SETTINGS,
  estimateRepair,
  woodSettingsSchema,
  type RepairEstimateInput,
  type WoodSettings,
} from '@/shared/wood';
import { fieldOf } from './support/domain-error';

const MM_PER_IN = 25.4;

// A 70 × 50 mm white-ash sill, 1800 mm long, 300 mm of it decayed.
const sill: RepairEstimateInput = {
  option: 'splice',
  widthMm: 70,
  depthMm: 50,
  memberLengthMm: 1800,
  affectedLengthMm: 300,
  species: 'white-ash',
  settings: DEFAULT_WOOD_SETTINGS,
  labourRatePerHour: 60,
};

function estimate(partial: Partial<RepairEstimateInput>) {
  return estimateRepair({ ...sill, ...partial });
}

describe('estimateRepair', () => {
  it('the default settings are valid settings', () => {
    expect(woodSettingsSchema.safeParse(DEFAULT_WOOD_SETTINGS).success).toBe(true);
  });

  it('splice: the affected length plus a scarf at each end, with the FAA spacing rule', () => {
    const e = estimate({});
    // Scarf through the 50 mm depth at the default 1:10 → 500 mm; FAA AC 43.13-1B §1-40: 3 × 500 apart.
    expect(e.splice).toEqual({ slope: 10, scarfLengthMm: 500, minSpacingMm: 1500 });
    expect(e.cutList).toHaveLength(1);
    const line = e.cutList[0];
    expect(line.finishedLengthMm).toBe(300 + 2 * 500);
    // 50 mm finished = 1.97 in: more than 8/4 gives (1 3/4 in S2S), so 10/4 (2 1/4 in); NHLA, memory.
    expect(line.roughQuarters).toBe(10);
    expect(line.finishedThicknessMm).toBe(50);
    expect(line.finishedWidthMm).toBe(70);
    // Board feet on the rough thickness: 2.5 in × 70/25.4 in × 1300/25.4 in / 144.
    const bf = (2.5 * (70 / MM_PER_IN) * (1300 / MM_PER_IN)) / 144;
    expect(line.boardFeet).toBeCloseTo(bf, 2);
    expect(line.boardFeetWithWaste).toBeCloseTo(bf * 1.3, 2);
    expect(line.cost).toBeCloseTo(line.boardFeetWithWaste * 9, 2);
    expect(line.cost).toBeCloseTo(bf * 1.3 * 9, 1);
    expect(e.hours).toBe(DEFAULT_WOOD_SETTINGS.hoursPerOperation.splice);
    expect(e.labourCost).toBe(4 * 60);
    expect(e.materialCost).toBe(line.cost);
    expect(e.totalCost).toBeCloseTo(240 + line.cost, 2);
    expect(e.notes!.join(' ')).toMatch(/FAA AC 43\.13-1B/);
  });

  it('replace-member: the full length plus a 50 mm trim allowance (common practice), no splice', () => {
    const e = estimate({ option: 'replace-member' });
    expect(e.splice).toBeNull();
    expect(e.cutList[0].finishedLengthMm).toBe(1850);
    expect(e.hours).toBe(8);
    expect(e.notes!.join(' ')).toMatch(/common practice/);
  });

  it('keep and consolidate need no timber', () => {
    for (const option of ['keep', 'consolidate'] as const) {
      const e = estimate({ option });
      expect(e.cutList).toEqual([]);
      expect(e.splice).toBeNull();
      expect(e.materialCost).toBe(0);
      expect(e.totalCost).toBe(e.labourCost);
    }
    expect(estimate({ option: 'consolidate' }).hours).toBe(2);
  });

  it('uses the workshop’s slope, hours, waste, price and species', () => {
    const settings: WoodSettings = {
      ...DEFAULT_WOOD_SETTINGS,
      scarfSlope: 12,
      wasteFactorPercent: 0,
      hoursPerOperation: { ...DEFAULT_WOOD_SETTINGS.hoursPerOperation, splice: 6 },
      timberPricePerBoardFoot: {
        ...DEFAULT_WOOD_SETTINGS.timberPricePerBoardFoot,
        'white-oak': 20,
      },
    };
    const e = estimate({ settings, species: 'white-oak', labourRatePerHour: 50 });
    expect(e.splice!.scarfLengthMm).toBe(600);
    expect(e.cutList[0].finishedLengthMm).toBe(1500);
    expect(e.cutList[0].boardFeetWithWaste).toBe(e.cutList[0].boardFeet);
    expect(e.cutList[0].cost).toBeCloseTo(e.cutList[0].boardFeetWithWaste * 20, 2);
    expect(e.labourCost).toBe(300);
  });

  it('figures thin panels on 4/4 and the thinner dimension as thickness', () => {
    // A 390 × 19 mm floor board: 19 mm = 0.75 in fits 4/4 (13/16 in S2S); board feet on 1 in.
    const e = estimate({
      option: 'replace-member',
      widthMm: 390,
      depthMm: 19,
      memberLengthMm: 1000,
    });
    const line = e.cutList[0];
    expect(line.roughQuarters).toBe(4);
    expect(line.finishedThicknessMm).toBe(19);
    expect(line.boardFeet).toBeCloseTo((1 * (390 / MM_PER_IN) * (1050 / MM_PER_IN)) / 144, 2);
  });

  it.each([
    ['widthMm', { widthMm: -70 }],
    ['depthMm', { depthMm: Number.NaN }],
    ['memberLengthMm', { memberLengthMm: 0 }],
    ['affectedLengthMm', { affectedLengthMm: -1 }],
    ['labourRatePerHour', { labourRatePerHour: -10 }],
    ['species', { species: 'teak' }],
    ['option', { option: 'glue-it' as never }],
    // 120 mm finished = 4.7 in, more than 16/4 stock gives (3 3/4 in S2S).
    ['depthMm', { option: 'replace-member' as const, widthMm: 150, depthMm: 120 }],
  ])('rejects a bad %s', (field, partial) => {
    expect(fieldOf(() => estimate(partial))).toBe(field);
  });
});
