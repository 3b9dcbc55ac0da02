/**
 * Types of the wood-science API (shared/wood/index.ts exports the functions). Units are
 * millimetres, °C and percent unless a name says inches.
 */
import type { StructuralClass, SpeciesKey } from '../body-plans/schema';
import type { DECAY_TYPES } from '../schemas/finding';

type DecayType = (typeof DECAY_TYPES)[number];

export type DecayFaces = { top?: number; bottom?: number; left?: number; right?: number };

export interface ResidualSectionInput {
  /** Finished width of the member (across the face you see), mm. */
  width: number;
  /** Finished depth (into the body; bending is about the axis parallel to the width), mm. */
  depth: number;
  /** Depth of decayed wood measured in from each face, mm. */
  decay: DecayFaces;
}

export interface ResidualSection {
  width: number;
  depth: number;
  area: number;
  sectionModulus: number;
  momentOfInertia: number;
  areaRatio: number;
  sectionModulusRatio: number;
  momentOfInertiaRatio: number;
}

export type DecayRiskLevel = 'dry' | 'elevated' | 'decay-possible' | 'saturated';
export interface DecayRisk {
  level: DecayRiskLevel;
  reason: string;
}

export const AGENT_KEYS = [
  'brown-rot-fungi',
  'white-rot-fungi',
  'soft-rot-fungi',
  'drywood-termites',
  'subterranean-termites',
  'lyctid-beetles',
  'anobiid-beetles',
  'bostrichid-beetles',
  'old-house-borer',
  'carpenter-ants',
] as const;
export type AgentKey = (typeof AGENT_KEYS)[number];

/** powder = flour/talc-like; pellets = hard, elongate, ridged; fibrous = coarse shavings with insect parts; packed = tightly packed meal. */
export type Frass = 'powder' | 'pellets' | 'fibrous' | 'packed';

/** What was seen; every field optional (unknown). */
export interface AgentEvidence {
  holeDiameterMm?: number | null;
  holeShape?: 'round' | 'oval' | null;
  frass?: Frass | null;
  /** Every kind of frass seen, when more than one (anobiid frass is fine powder with pellets); joined with `frass`. */
  frassKinds?: Frass[];
  mudTubes?: boolean;
  galleries?: boolean;
  liveInsects?: boolean;
  wings?: boolean;
  woodType?: 'hardwood' | 'softwood' | null;
  moisturePercent?: number | null;
  decayType?: DecayType | null;
}

export interface AgentCandidate {
  agent: AgentKey;
  label: string;
  /** Relative strength of the match, 0–1 (not a probability). */
  score: number;
  /** The evidence that matched, in plain words, each with its source. */
  reasons: string[];
}

export const VERDICT_OPTIONS = [
  'keep',
  'consolidate',
  'splice',
  'replace-member',
  'replace-assembly',
] as const;
export type VerdictOption = (typeof VERDICT_OPTIONS)[number];

export const DECISION_CLASSES = ['structural-must-fix', 'cosmetic', 'monitor'] as const;
export type DecisionClass = (typeof DECISION_CLASSES)[number];

export interface VerdictInput {
  structuralClass: StructuralClass;
  /** From residualSection; 1 when no decay was measured. */
  sectionModulusRatio: number;
  areaRatio: number;
  affectedLengthMm: number;
  memberLengthMm: number;
  atJointOrFitting: boolean;
  /** Worst open severity 0–4 in the zone. */
  severity: number;
  /** Active insects or active decay still present (treat before repair). */
  activeAgent: boolean;
  /** How many other members of the same assembly already need replacing (0 when unknown). */
  assemblyMembersNeedingReplacement: number;
  /**
   * Scarf length at the workshop's slope (spliceGeometry), mm. When given, a splice whose new
   * wood (affected length + a scarf at each end) would be longer than the member becomes a
   * replacement.
   */
  scarfLengthMm?: number | null;
}

export interface Verdict {
  option: VerdictOption;
  decisionClass: DecisionClass;
  reasons: string[];
}

export interface CutListLine {
  species: SpeciesKey;
  finishedThicknessMm: number;
  finishedWidthMm: number;
  finishedLengthMm: number;
  /** Rough thickness in quarters of an inch (4 = 4/4). */
  roughQuarters: number;
  boardFeet: number;
  boardFeetWithWaste: number;
  cost: number;
}

export interface SpliceGeometry {
  /** Slope as 1:N. */
  slope: number;
  scarfLengthMm: number;
  /** Two splices, or a splice and a reinforcing plate, no closer than this (FAA AC 43.13-1B §1-40). */
  minSpacingMm: number;
}

export interface RepairEstimate {
  hours: number;
  labourCost: number;
  materialCost: number;
  totalCost: number;
  cutList: CutListLine[];
  splice: SpliceGeometry | null;
  /** How the estimate was figured and anything to watch (plain sentences). */
  notes?: string[];
}
