/**
 * Likely agent from what was seen. It suggests and never concludes: the UI always advises
 * confirmation by a professional. Each rule cites its source (SOURCES.md, "Insects" and
 * "Decay and strength"); the weights are our own, for ranking only.
 */
import { DECAY_TYPES } from '../schemas/finding';
import { DomainError, requireNonNegative } from './errors';
import {
  DECAY_THRESHOLD_PERCENT,
  FIBRE_SATURATION_PERCENT,
  ELEVATED_THRESHOLD_PERCENT,
  isSpeciesKey,
} from './moisture';
import {
  AGENT_KEYS,
  type AgentCandidate,
  type AgentEvidence,
  type AgentKey,
  type Frass,
} from './types';

export const AGENT_LABELS: Record<AgentKey, string> = {
  'brown-rot-fungi': 'Brown-rot fungi',
  'white-rot-fungi': 'White-rot fungi',
  'soft-rot-fungi': 'Soft-rot fungi',
  'drywood-termites': 'Drywood termites',
  'subterranean-termites': 'Subterranean termites',
  'lyctid-beetles': 'Lyctid powderpost beetles',
  'anobiid-beetles': 'Anobiid (furniture) beetles',
  'bostrichid-beetles': 'Bostrichid (false powderpost) beetles',
  'old-house-borer': 'Old house borer',
  'carpenter-ants': 'Carpenter ants',
};

const TABLE_14_2 = 'Wood Handbook, FPL-GTR-190, Table 14-2';

/** Normalised evidence: unknowns as null, every frass kind seen in one list. */
interface Seen {
  hole: number | null;
  shape: 'round' | 'oval' | null;
  frass: Frass[];
  mudTubes: boolean;
  galleries: boolean;
  liveInsects: boolean;
  wings: boolean;
  wood: 'hardwood' | 'softwood' | null;
  mc: number | null;
  decay: AgentEvidence['decayType'];
}

/** One rule's contribution: `primary` evidence can put an agent on the list; the rest only ranks it. */
interface Match {
  weight: number;
  reason: string;
  primary?: boolean;
}

/** A rule set returns its matches, or null when the evidence rules the agent out. */
type Rules = (s: Seen) => Match[] | null;

function mm(n: number): string {
  return `${Math.round(n * 10) / 10} mm`;
}

/** Exit-hole size (and shape) against a published range. */
function holeMatch(
  s: Seen,
  min: number,
  max: number,
  shape: 'round' | 'oval',
  what: string,
): Match[] {
  const out: Match[] = [];
  if (s.hole !== null && s.hole >= min && s.hole <= max) {
    out.push({
      weight: 0.35,
      primary: true,
      reason: `${mm(s.hole)} exit holes fall in the ${min}–${max} mm range of ${what} (${TABLE_14_2})`,
    });
    if (s.shape === shape)
      out.push({ weight: 0.1, reason: `the holes are ${shape}, as theirs are (${TABLE_14_2})` });
  } else if (s.hole === null && s.shape === shape) {
    out.push({
      weight: 0.1,
      primary: true,
      reason: `${shape} exit holes, as ${what} make (size not measured; ${TABLE_14_2})`,
    });
  }
  return out;
}

function has(s: Seen, f: Frass): boolean {
  return s.frass.includes(f);
}

function supporting(s: Seen, what: 'galleries' | 'live' | 'wings', reason: string): Match[] {
  const seen = what === 'galleries' ? s.galleries : what === 'live' ? s.liveInsects : s.wings;
  return seen ? [{ weight: 0.05, reason }] : [];
}

const lyctid: Rules = (s) => {
  if (s.wood === 'softwood') return null; // large-pored hardwoods only (Table 14-2)
  if (s.shape === 'oval') return null;
  return [
    ...holeMatch(s, 0.8, 1.6, 'round', 'Lyctid powderpost beetles'),
    ...(has(s, 'powder')
      ? [
          {
            weight: 0.3,
            primary: true,
            reason: `loose flour-like frass, as Lyctids leave (${TABLE_14_2}; UC IPM 7418)`,
          },
        ]
      : []),
    ...(s.wood === 'hardwood'
      ? [
          {
            weight: 0.15,
            reason: `hardwood: Lyctids attack the sapwood of large-pored hardwoods (${TABLE_14_2})`,
          },
        ]
      : []),
    ...supporting(s, 'galleries', 'galleries in the wood'),
  ];
};

const anobiid: Rules = (s) => {
  if (s.shape === 'oval') return null;
  const wetEnough = s.mc !== null && s.mc >= ELEVATED_THRESHOLD_PERCENT;
  return [
    ...holeMatch(s, 1.6, 3, 'round', 'anobiid beetles'),
    ...(has(s, 'pellets')
      ? [
          {
            weight: 0.25,
            primary: true,
            reason: `frass with pellets, as anobiids leave (fine frass with elongate pellets, ${TABLE_14_2})`,
          },
        ]
      : []),
    ...(has(s, 'powder')
      ? [{ weight: 0.1, primary: true, reason: `fine frass (${TABLE_14_2})` }]
      : []),
    ...(wetEnough
      ? [
          {
            weight: 0.15,
            reason: `${s.mc} % moisture: anobiids need about 15 % or more (${TABLE_14_2})`,
          },
        ]
      : []),
    ...supporting(s, 'galleries', 'galleries in the wood'),
  ];
};

const bostrichid: Rules = (s) => {
  if (s.shape === 'oval') return null;
  return [
    ...holeMatch(s, 2.5, 7, 'round', 'bostrichid beetles'),
    ...(has(s, 'packed')
      ? [
          {
            weight: 0.3,
            primary: true,
            reason: `tightly packed frass, as bostrichids leave (${TABLE_14_2})`,
          },
        ]
      : []),
    ...(s.wood === 'hardwood'
      ? [{ weight: 0.15, reason: `hardwood: bostrichids attack hardwood sapwood (${TABLE_14_2})` }]
      : []),
    ...supporting(s, 'galleries', 'galleries in the wood'),
  ];
};

const oldHouseBorer: Rules = (s) => {
  if (s.wood === 'hardwood') return null; // softwoods only (state forestry and extension guides)
  const out: Match[] = [];
  const source = 'state forestry and extension guides';
  if (s.hole !== null && s.hole >= 6 && s.hole <= 10 && s.shape !== 'round') {
    out.push({
      weight: s.shape === 'oval' ? 0.5 : 0.3,
      primary: true,
      reason: `${mm(s.hole)}${s.shape === 'oval' ? ' oval' : ''} exit holes match the old house borer’s oval holes of about 6–10 mm (${source})`,
    });
  } else if (s.shape === 'oval' && s.hole === null) {
    out.push({
      weight: 0.15,
      primary: true,
      reason: `oval exit holes, as the old house borer makes (size not measured; ${source})`,
    });
  }
  if (s.wood === 'softwood')
    out.push({
      weight: 0.2,
      reason: `softwood: the old house borer attacks softwoods only (${source})`,
    });
  return [...out, ...supporting(s, 'galleries', 'galleries in the wood')];
};

const drywoodTermites: Rules = (s) => [
  ...(has(s, 'pellets')
    ? [
        {
          weight: 0.5,
          primary: true,
          reason:
            'hard pellets: drywood termites push out hard elongate pellets about 0.8 mm long with six flattened sides (UC IPM 7440)',
        },
      ]
    : []),
  ...supporting(s, 'wings', 'shed wings: termites swarm and drop their wings (UC IPM 7440)'),
  ...supporting(s, 'galleries', 'galleries in the wood'),
];

const subterraneanTermites: Rules = (s) => [
  ...(s.mudTubes
    ? [
        {
          weight: 0.6,
          primary: true,
          reason:
            'mud tubes: shelter tubes from soil to wood are often the first sign of subterranean termites (UC IPM 7415)',
        },
      ]
    : []),
  ...supporting(s, 'wings', 'shed wings: termites swarm and drop their wings (UC IPM 7415)'),
  ...supporting(s, 'galleries', 'galleries in the wood'),
];

const carpenterAnts: Rules = (s) => {
  const damp = (s.mc !== null && s.mc >= DECAY_THRESHOLD_PERCENT) || isRot(s.decay);
  return [
    ...(has(s, 'fibrous')
      ? [
          {
            weight: 0.5,
            primary: true,
            reason:
              'coarse fibrous frass: carpenter ants excavate without eating the wood and push out shavings with insect parts (NAVFAC MO-312)',
          },
        ]
      : []),
    ...(damp
      ? [
          {
            weight: 0.2,
            reason: 'moist or decayed wood, which carpenter ants favour (NAVFAC MO-312)',
          },
        ]
      : []),
    ...supporting(s, 'live', 'live insects were seen'),
    ...supporting(s, 'galleries', 'galleries in the wood'),
  ];
};

function isRot(d: Seen['decay']): boolean {
  return d === 'brown-rot' || d === 'white-rot' || d === 'soft-rot';
}

const ROT_SIGNS: Record<'brown-rot' | 'white-rot' | 'soft-rot', string> = {
  'brown-rot':
    'brown rot recorded: brown, shrunken wood cracking into cubes that crumbles dry (Wood Handbook ch. 14)',
  'white-rot':
    'white rot recorded: paler, spongy or stringy wood that keeps its fibres (Wood Handbook ch. 14)',
  'soft-rot': 'soft rot recorded: a shallow softened surface in wet wood (Wood Handbook ch. 14)',
};

function fungi(type: 'brown-rot' | 'white-rot' | 'soft-rot'): Rules {
  return (s) => {
    const out: Match[] = [];
    if (s.decay === type) out.push({ weight: 0.6, primary: true, reason: ROT_SIGNS[type] });
    else if (s.decay === 'unknown')
      out.push({ weight: 0.2, primary: true, reason: 'decay of an unrecorded type' });
    else return null;
    if (s.mc !== null && s.mc >= DECAY_THRESHOLD_PERCENT) {
      out.push({
        weight: 0.25,
        reason: `${s.mc} % moisture: at or above 20 % decay fungi can grow (Wood Handbook ch. 5)`,
      });
      if (type === 'soft-rot' && s.mc >= FIBRE_SATURATION_PERCENT) {
        out.push({
          weight: 0.1,
          reason: 'very wet wood, where soft rot is typical (Wood Handbook ch. 14)',
        });
      }
    } else if (s.mc !== null) {
      out.push({
        weight: -0.2,
        reason: `${s.mc} % moisture is below 20 %, so the decay may be inactive now (Wood Handbook ch. 5)`,
      });
    }
    return out;
  };
}

const RULES: Record<AgentKey, Rules> = {
  'brown-rot-fungi': fungi('brown-rot'),
  'white-rot-fungi': fungi('white-rot'),
  'soft-rot-fungi': fungi('soft-rot'),
  'drywood-termites': drywoodTermites,
  'subterranean-termites': subterraneanTermites,
  'lyctid-beetles': lyctid,
  'anobiid-beetles': anobiid,
  'bostrichid-beetles': bostrichid,
  'old-house-borer': oldHouseBorer,
  'carpenter-ants': carpenterAnts,
};

function normalise(e: AgentEvidence): Seen {
  const hole = e.holeDiameterMm ?? null;
  if (hole !== null) requireNonNegative('holeDiameterMm', hole);
  const mc = e.moisturePercent ?? null;
  if (mc !== null) requireNonNegative('moisturePercent', mc);
  const frass = [...new Set([...(e.frass ? [e.frass] : []), ...(e.frassKinds ?? [])])];
  return {
    hole: hole !== null && hole > 0 ? hole : null,
    shape: e.holeShape ?? null,
    frass,
    mudTubes: e.mudTubes === true,
    galleries: e.galleries === true,
    liveInsects: e.liveInsects === true,
    wings: e.wings === true,
    wood: e.woodType ?? null,
    mc: mc === null ? null : Math.round(mc * 10) / 10,
    decay: e.decayType ?? null,
  };
}

/**
 * Candidates with at least one primary match, strongest first (ties in AGENT_KEYS order).
 * Score = sum of weights, clamped to 0–1: a ranking, not a probability.
 */
export function likelyAgents(evidence: AgentEvidence): AgentCandidate[] {
  const seen = normalise(evidence);
  const out: AgentCandidate[] = [];
  for (const agent of AGENT_KEYS) {
    const matches = RULES[agent](seen);
    if (!matches || !matches.some((m) => m.primary)) continue;
    const total = matches.reduce((sum, m) => sum + m.weight, 0);
    const score = Math.round(Math.min(1, Math.max(0.01, total)) * 100) / 100;
    out.push({ agent, label: AGENT_LABELS[agent], score, reasons: matches.map((m) => m.reason) });
  }
  return out.sort(
    (a, b) => b.score - a.score || AGENT_KEYS.indexOf(a.agent) - AGENT_KEYS.indexOf(b.agent),
  );
}

const FRASS_BY_EVIDENCE: Record<string, Frass> = {
  'frass-powder': 'powder',
  'frass-pellets': 'pellets',
  'frass-fibrous': 'fibrous',
};

/** A finding's recorded evidence as AgentEvidence; Douglas-fir is the one softwood species. */
export function evidenceFromFinding(f: {
  insectEvidence: string[];
  holeDiameterMm: number | null;
  decayType: string;
  moisturePercent?: number | null;
  species?: string | null;
}): AgentEvidence {
  if (!(DECAY_TYPES as readonly string[]).includes(f.decayType)) {
    throw new DomainError('decayType', `Unknown decay type "${f.decayType}".`);
  }
  const ev = new Set(f.insectEvidence);
  const frassKinds = f.insectEvidence
    .map((k) => FRASS_BY_EVIDENCE[k])
    .filter((k): k is Frass => k !== undefined);
  const round = ev.has('exit-holes-round');
  const oval = ev.has('exit-holes-oval');
  const species = f.species ?? null;
  return {
    holeDiameterMm: f.holeDiameterMm,
    holeShape: round === oval ? null : round ? 'round' : 'oval',
    frass: frassKinds[0] ?? null,
    frassKinds,
    mudTubes: ev.has('mud-tubes'),
    galleries: ev.has('galleries'),
    liveInsects: ev.has('live-insects'),
    wings: ev.has('wings'),
    woodType:
      species === null || !isSpeciesKey(species)
        ? null
        : species === 'douglas-fir'
          ? 'softwood'
          : 'hardwood',
    moisturePercent: f.moisturePercent ?? null,
    decayType: f.decayType as AgentEvidence['decayType'],
  };
}
