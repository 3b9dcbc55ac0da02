import { INSECT_EVIDENCE } from '@/shared/schemas/finding';
import {
  AGENT_KEYS,
  AGENT_LABELS,
  evidenceFromFinding,
  likelyAgents,
  type AgentEvidence,
  type AgentKey,
} from '@/shared/wood';
import { fieldOf } from './support/domain-error';

function ranking(e: AgentEvidence): AgentKey[] {
  return likelyAgents(e).map((c) => c.agent);
}

function top(e: AgentEvidence): AgentKey | undefined {
  return ranking(e)[0];
}

describe('likelyAgents against Wood Handbook Table 14-2 hole sizes and the extension sources', () => {
  it('1.2 mm round holes with flour-like frass in ash → Lyctid powderpost beetles first', () => {
    // Wood Handbook (FPL-GTR-190), Table 14-2: Lyctids 0.8–1.6 mm round, flour-like frass, hardwood sapwood
    const list = likelyAgents({
      holeDiameterMm: 1.2,
      holeShape: 'round',
      frass: 'powder',
      woodType: 'hardwood',
    });
    expect(list[0].agent).toBe('lyctid-beetles');
    expect(list[0].reasons.join(' ')).toMatch(/0\.8–1\.6 mm/);
    expect(list[0].reasons.join(' ')).toMatch(/Table 14-2/);
  });

  it.each([0.8, 1.0, 1.6])('%s mm round holes in hardwood: Lyctids on the list', (d) => {
    // Wood Handbook (FPL-GTR-190), Table 14-2: Lyctid exit holes 0.8–1.6 mm (1/32–1/16 in)
    expect(ranking({ holeDiameterMm: d, holeShape: 'round', woodType: 'hardwood' })).toContain(
      'lyctid-beetles',
    );
  });

  it('2 mm holes with pelleted frass → anobiid beetles at the top', () => {
    // Wood Handbook (FPL-GTR-190), Table 14-2: anobiids 1.6–3 mm, fine frass with elongate pellets
    const list = ranking({
      holeDiameterMm: 2,
      holeShape: 'round',
      frass: 'pellets',
      moisturePercent: 16,
    });
    expect(list[0]).toBe('anobiid-beetles');
    expect(list).not.toContain('lyctid-beetles');
  });

  it('5 mm round holes with packed frass in hardwood → bostrichid beetles first', () => {
    // Wood Handbook (FPL-GTR-190), Table 14-2: bostrichids 2.5–7 mm, tightly packed frass, hardwood sapwood
    expect(
      top({ holeDiameterMm: 5, holeShape: 'round', frass: 'packed', woodType: 'hardwood' }),
    ).toBe('bostrichid-beetles');
    expect(ranking({ holeDiameterMm: 5, holeShape: 'round' })).not.toContain('anobiid-beetles');
  });

  it('8 mm oval holes in Douglas-fir → old house borer first', () => {
    // State forestry and extension guides: old house borer, oval exit holes about 6–10 mm, softwoods only
    const e = evidenceFromFinding({
      insectEvidence: ['exit-holes-oval'],
      holeDiameterMm: 8,
      decayType: 'none',
      species: 'douglas-fir',
    });
    const list = likelyAgents(e);
    expect(list[0].agent).toBe('old-house-borer');
    expect(list.map((c) => c.agent)).not.toContain('lyctid-beetles');
  });

  it('never suggests the old house borer in hardwood, nor Lyctids in softwood', () => {
    // Old house borer: softwoods only; Lyctids: large-pored hardwoods (Table 14-2)
    expect(ranking({ holeDiameterMm: 8, holeShape: 'oval', woodType: 'hardwood' })).not.toContain(
      'old-house-borer',
    );
    expect(ranking({ holeDiameterMm: 1.2, frass: 'powder', woodType: 'softwood' })).not.toContain(
      'lyctid-beetles',
    );
  });

  it('mud tubes → subterranean termites (UC IPM 7415)', () => {
    const list = likelyAgents({ mudTubes: true });
    expect(list[0].agent).toBe('subterranean-termites');
    expect(list[0].reasons[0]).toMatch(/UC IPM 7415/);
  });

  it('hard pellets alone → drywood termites (UC IPM 7440)', () => {
    const list = likelyAgents({ frass: 'pellets' });
    expect(list[0].agent).toBe('drywood-termites');
    expect(list[0].reasons[0]).toMatch(/six flattened sides/);
  });

  it('coarse fibrous frass in damp wood → carpenter ants (NAVFAC MO-312)', () => {
    const list = likelyAgents({ frass: 'fibrous', moisturePercent: 24 });
    expect(list[0].agent).toBe('carpenter-ants');
    expect(list[0].reasons).toHaveLength(2);
    expect(list[0].reasons.join(' ')).toMatch(/NAVFAC MO-312/);
  });

  it('brown rot in wet wood → brown-rot fungi, with the 20 % threshold (Wood Handbook ch. 5)', () => {
    const list = likelyAgents({ decayType: 'brown-rot', moisturePercent: 26 });
    expect(list[0].agent).toBe('brown-rot-fungi');
    expect(list[0].reasons.join(' ')).toMatch(/20 %/);
    expect(list.map((c) => c.agent)).not.toContain('white-rot-fungi');
  });

  it('scores dry wood lower than wet wood for the same rot (Wood Handbook ch. 5: < 20 % stops decay)', () => {
    const wet = likelyAgents({ decayType: 'white-rot', moisturePercent: 25 })[0];
    const dry = likelyAgents({ decayType: 'white-rot', moisturePercent: 12 })[0];
    expect(wet.agent).toBe('white-rot-fungi');
    expect(dry.agent).toBe('white-rot-fungi');
    expect(dry.score).toBeLessThan(wet.score);
    expect(dry.reasons.join(' ')).toMatch(/inactive/);
  });

  it('lists nothing when nothing was seen, and only candidates with a matching sign', () => {
    expect(likelyAgents({})).toEqual([]);
    expect(likelyAgents({ woodType: 'hardwood', moisturePercent: 25, galleries: true })).toEqual(
      [],
    );
    expect(ranking({ mudTubes: true })).toEqual(['subterranean-termites']);
  });

  it('ranks by score, each score within (0, 1], each candidate with its label and a reason', () => {
    const list = likelyAgents({
      holeDiameterMm: 2.8,
      holeShape: 'round',
      frass: 'pellets',
      decayType: 'unknown',
      moisturePercent: 22,
      wings: true,
    });
    expect(list.length).toBeGreaterThan(3);
    for (let i = 1; i < list.length; i++)
      expect(list[i - 1].score).toBeGreaterThanOrEqual(list[i].score);
    for (const c of list) {
      expect(c.score).toBeGreaterThan(0);
      expect(c.score).toBeLessThanOrEqual(1);
      expect(c.label).toBe(AGENT_LABELS[c.agent]);
      expect(c.reasons.length).toBeGreaterThan(0);
    }
  });

  it('rejects a negative or NaN hole size and negative moisture', () => {
    expect(fieldOf(() => likelyAgents({ holeDiameterMm: -1 }))).toBe('holeDiameterMm');
    expect(fieldOf(() => likelyAgents({ holeDiameterMm: Number.NaN }))).toBe('holeDiameterMm');
    expect(fieldOf(() => likelyAgents({ moisturePercent: -3 }))).toBe('moisturePercent');
  });

  it('has a label for every agent', () => {
    for (const key of AGENT_KEYS) expect(AGENT_LABELS[key].length).toBeGreaterThan(3);
  });
});

describe('evidenceFromFinding', () => {
  it('maps every evidence key of the finding form', () => {
    const e = evidenceFromFinding({
      insectEvidence: [...INSECT_EVIDENCE].filter((k) => k !== 'exit-holes-oval'),
      holeDiameterMm: 1.5,
      decayType: 'white-rot',
      moisturePercent: 21,
      species: 'white-ash',
    });
    expect(e).toEqual({
      holeDiameterMm: 1.5,
      holeShape: 'round',
      frass: 'powder',
      frassKinds: ['powder', 'pellets', 'fibrous'],
      mudTubes: true,
      galleries: true,
      liveInsects: true,
      wings: true,
      woodType: 'hardwood',
      moisturePercent: 21,
      decayType: 'white-rot',
    });
  });

  it('treats Douglas-fir as softwood, unknown species as unknown, both hole shapes as unknown shape', () => {
    const base = { holeDiameterMm: null, decayType: 'none' };
    expect(
      evidenceFromFinding({ ...base, insectEvidence: [], species: 'douglas-fir' }).woodType,
    ).toBe('softwood');
    expect(evidenceFromFinding({ ...base, insectEvidence: [], species: null }).woodType).toBeNull();
    expect(
      evidenceFromFinding({ ...base, insectEvidence: [], species: 'teak' }).woodType,
    ).toBeNull();
    const both = evidenceFromFinding({
      ...base,
      insectEvidence: ['exit-holes-round', 'exit-holes-oval'],
    });
    expect(both.holeShape).toBeNull();
    expect(both.moisturePercent).toBeNull();
  });

  it('keeps pellets and powder together, so anobiid frass (powder with pellets) ranks anobiids over termites', () => {
    // Wood Handbook (FPL-GTR-190), Table 14-2: anobiid frass is fine powder with elongate pellets, holes 1.6–3 mm
    const e = evidenceFromFinding({
      insectEvidence: ['frass-powder', 'frass-pellets', 'exit-holes-round'],
      holeDiameterMm: 2.2,
      decayType: 'none',
      moisturePercent: 17,
      species: 'white-oak',
    });
    expect(likelyAgents(e)[0].agent).toBe('anobiid-beetles');
  });

  it('rejects an unknown decay type', () => {
    expect(
      fieldOf(() =>
        evidenceFromFinding({ insectEvidence: [], holeDiameterMm: null, decayType: 'grey-rot' }),
      ),
    ).toBe('decayType');
  });
});
