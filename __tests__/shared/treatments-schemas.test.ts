import { can, ROLES } from '@/shared/roles';
import {
  correctTreatmentRequest,
  createTreatmentRequest,
  dueListQuery,
  mergeSettings,
  moveRecheckRequest,
  recordRecheckRequest,
  timelineQuery,
  treatmentResponse,
  updateWorkshopRequest,
  workshopSettings,
  type CreateTreatmentRequest,
} from '@/shared/schemas';
import {
  cautionsFor,
  DEFAULT_TREATMENT_SETTINGS,
  TREATMENT_CAUTIONS,
  treatmentSettingsSchema,
} from '@/shared/treatments';

// Invented product and registration; Soundframe itself never proposes one.
const valid: CreateTreatmentRequest = {
  appliedAt: '2026-05-04T09:30:00.000Z',
  applicatorName: 'Ines Varga',
  productName: 'Example Borate Concentrate',
  registrationNumber: 'REG-0000-TEST',
  activeIngredient: 'Disodium octaborate tetrahydrate',
  concentration: '40 % w/w',
  method: 'brush',
  targetAgent: 'anobiid-beetles',
  zoneKeys: ['left-sill', 'right-sill'],
  quantity: { amount: 1.5, unit: 'L' },
  reentryHours: 4,
  ppe: ['nitrile gloves', 'goggles'],
  labelConfirmed: true,
};

const fieldsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  (r.error?.issues ?? []).map((i) => i.path.join('.'));

describe('createTreatmentRequest', () => {
  it('accepts a complete record and fills the optional text', () => {
    const r = createTreatmentRequest.parse(valid);
    expect(r.licenceNumber).toBe('');
    expect(r.conditions).toEqual({ airTempC: null, woodMoisturePercent: null });
  });

  it('names every missing label field', () => {
    const r = createTreatmentRequest.safeParse({
      ...valid,
      productName: ' ',
      registrationNumber: '',
      activeIngredient: undefined,
      concentration: '',
    });
    expect(fieldsOf(r).sort()).toEqual([
      'activeIngredient',
      'concentration',
      'productName',
      'registrationNumber',
    ]);
  });

  it('keeps the concentration as written on the label', () => {
    expect(
      createTreatmentRequest.parse({ ...valid, concentration: '0.5% (5 g/L)' }).concentration,
    ).toBe('0.5% (5 g/L)');
  });

  it.each([
    ['reentryHours', { reentryHours: -1 }],
    ['labelConfirmed', { labelConfirmed: false }],
    ['ppe', { ppe: [] }],
    ['zoneKeys', { zoneKeys: [] }],
    ['zoneKeys', { zoneKeys: ['left-sill', 'left-sill'] }],
    ['zoneKeys', { zoneKeys: Array.from({ length: 51 }, (_, i) => `z${i}`) }],
    ['quantity.amount', { quantity: { amount: -2, unit: 'L' } }],
    ['method', { method: 'fogger' }],
    ['targetAgent', { targetAgent: 'woodworm' }],
    ['appliedAt', { appliedAt: '4 May 2026' }],
  ])('rejects bad %s', (field, over) => {
    expect(fieldsOf(createTreatmentRequest.safeParse({ ...valid, ...over }))).toEqual([field]);
  });

  it('asks to confirm the label in plain words', () => {
    const r = createTreatmentRequest.safeParse({ ...valid, labelConfirmed: false });
    expect(r.error?.issues[0].message).toBe('Confirm you read and followed the label');
  });
});

describe('correctTreatmentRequest and treatmentResponse', () => {
  it('needs a version and a reason', () => {
    expect(fieldsOf(correctTreatmentRequest.safeParse(valid)).sort()).toEqual([
      'reason',
      'version',
    ]);
    expect(
      correctTreatmentRequest.safeParse({ ...valid, version: 1, reason: 'Wrong dilution' }).success,
    ).toBe(true);
    expect(correctTreatmentRequest.safeParse({ ...valid, version: 1, reason: ' ' }).success).toBe(
      false,
    );
  });

  it('a response carries the data and the earlier versions', () => {
    const { labelConfirmed: _confirmed, ...data } = createTreatmentRequest.parse(valid);
    const r = treatmentResponse.parse({
      ...data,
      id: '8b1d7a52-3c4e-4f60-9a7b-1c2d3e4f5a6b',
      vehicleId: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f',
      version: 2,
      recordedById: null,
      recordedByName: 'Ines Varga',
      createdAt: '2026-05-04T10:00:00.000Z',
      updatedAt: '2026-05-05T10:00:00.000Z',
      versions: [
        {
          version: 1,
          reason: 'Wrong dilution',
          changedByName: 'Ines Varga',
          changedAt: '2026-05-05T10:00:00.000Z',
          data,
        },
      ],
    });
    expect(r.versions[0].data.productName).toBe('Example Borate Concentrate');
  });
});

describe('re-check requests', () => {
  it('fresh evidence needs the finding it creates', () => {
    expect(
      fieldsOf(recordRecheckRequest.safeParse({ version: 0, result: 'fresh-evidence' })),
    ).toEqual(['finding']);
    const ok = recordRecheckRequest.parse({
      version: 0,
      result: 'fresh-evidence',
      finding: { zoneKey: 'left-sill', severity: 2, insectEvidence: ['frass-powder'] },
    });
    expect(ok.finding?.activity).toBe('active');
    expect(recordRecheckRequest.parse({ version: 3, result: 'clean' })).toMatchObject({
      frassCleaned: false,
      notes: '',
    });
  });

  it('a move needs a real date and a reason', () => {
    expect(
      fieldsOf(moveRecheckRequest.safeParse({ version: 0, dueDate: '2027-02-29', reason: 'x' })),
    ).toEqual(['dueDate']);
    expect(
      fieldsOf(moveRecheckRequest.safeParse({ version: 0, dueDate: '2028-02-29', reason: '' })),
    ).toEqual(['reason']);
  });

  it('due list days default to 7 and stay within 1..90', () => {
    expect(dueListQuery.parse({})).toEqual({ days: 7 });
    expect(dueListQuery.parse({ days: '30' }).days).toBe(30);
    expect(dueListQuery.safeParse({ days: '91' }).success).toBe(false);
    expect(dueListQuery.safeParse({ days: '0' }).success).toBe(false);
  });

  it('timeline kinds come comma-separated, every kind when left out', () => {
    expect(timelineQuery.parse({}).kinds).toEqual(['survey', 'finding', 'treatment', 'recheck']);
    expect(timelineQuery.parse({ kinds: 'treatment,recheck' }).kinds).toEqual([
      'treatment',
      'recheck',
    ]);
    expect(timelineQuery.safeParse({ kinds: 'treatment,invoice' }).success).toBe(false);
  });
});

describe('workshop treatment settings', () => {
  it('a workshop saved before treatments existed reads back with the defaults', () => {
    const s = workshopSettings.parse({});
    expect(s.treatments).toEqual(DEFAULT_TREATMENT_SETTINGS);
    s.treatments.recheckPlans.beetles.push(999);
    expect(DEFAULT_TREATMENT_SETTINGS.recheckPlans.beetles).not.toContain(999);
  });

  it('a PATCH may carry any subset, merged key by key over the saved value', () => {
    const body = updateWorkshopRequest.parse({
      settings: {
        treatments: { clearance: { minSpanDays: 400 }, recheckPlans: { fungi: [60, 120] } },
      },
    });
    const merged = treatmentSettingsSchema.parse(
      mergeSettings(DEFAULT_TREATMENT_SETTINGS, body.settings?.treatments),
    );
    expect(merged.clearance).toEqual({ cleanChecksRequired: 3, minSpanDays: 400 });
    expect(merged.recheckPlans.fungi).toEqual([60, 120]);
    expect(merged.recheckPlans.beetles).toEqual(DEFAULT_TREATMENT_SETTINGS.recheckPlans.beetles);
    expect(merged.timeZone).toBe('UTC');
  });

  it('a PATCH with an unknown time zone is refused', () => {
    expect(
      updateWorkshopRequest.safeParse({
        settings: { treatments: { timeZone: 'Atlantis/Capital' } },
      }).success,
    ).toBe(false);
  });
});

describe('roles', () => {
  it('owners, inspectors and applicators record treatments and re-checks; clients do not', () => {
    const writers = ROLES.filter((r) => can(r, 'treatments.write'));
    expect(writers).toEqual(['owner', 'inspector', 'applicator']);
    expect(ROLES.filter((r) => can(r, 'rechecks.write'))).toEqual(writers);
    expect(can('applicator', 'findings.write')).toBe(false);
  });
});

describe('TREATMENT_CAUTIONS', () => {
  it('cover the label, PPE, foggers, fumigation, borates, licensing and dust, each with a source', () => {
    expect(TREATMENT_CAUTIONS.map((c) => c.key)).toEqual([
      'label-is-law',
      'ppe-reentry',
      'foggers',
      'fumigation',
      'borates',
      'licensing',
      'dust',
    ]);
    for (const c of TREATMENT_CAUTIONS) expect(c.source.trim().length).toBeGreaterThan(10);
    const source = (key: string) => TREATMENT_CAUTIONS.find((c) => c.key === key)!.source;
    expect(source('label-is-law')).toContain('40 CFR 156.10');
    expect(source('foggers')).toContain('ENTFACT-643');
    expect(source('fumigation')).toContain('US EPA');
    expect(source('borates')).toContain('AWPA');
    expect(source('dust')).toMatch(/common practice/i);
  });

  it('never state a dose or rate of their own', () => {
    for (const c of TREATMENT_CAUTIONS) {
      expect(c.text).not.toMatch(/\d+(\.\d+)?\s*(%|ml|l\b|g\b|ppm|oz|gal)/i);
    }
  });

  it('put the cautions for the chosen method first and keep all of them', () => {
    const keys = cautionsFor('fumigation').map((c) => c.key);
    expect(keys[0]).toBe('fumigation');
    expect([...keys].sort()).toEqual(TREATMENT_CAUTIONS.map((c) => c.key).sort());
    expect(cautionsFor(null).map((c) => c.key)).toEqual(TREATMENT_CAUTIONS.map((c) => c.key));
    expect(cautionsFor('brush')[0].key).toBe('borates');
  });
});
