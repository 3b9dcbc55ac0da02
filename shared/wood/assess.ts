import type { StructuralClass } from '../body-plans/schema';
import { residualSection } from './section';
import type { WoodSettings } from './settings';
import { scarfLength } from './splice';
import type { DecayFaces, ResidualSection, Verdict, VerdictInput } from './types';
import { recommendVerdict } from './verdict';

export interface MemberMeasurements {
  widthMm: number;
  depthMm: number;
  decayMm: DecayFaces;
  affectedLengthMm: number;
  memberLengthMm: number;
  atJointOrFitting: boolean;
}

export interface MemberContext {
  structuralClass: StructuralClass;
  /** Worst open finding severity in the zone (0 when none). */
  worstSeverity: number;
  activeAgent: boolean;
  assemblyMembersNeedingReplacement: number;
}

/**
 * One member's residual section and recommendation from what was measured, the zone and the
 * workshop's rules. The client's live preview and the server's stored verdict both call this,
 * so they cannot disagree.
 */
export function assessMember(
  m: MemberMeasurements,
  ctx: MemberContext,
  settings: Pick<WoodSettings, 'verdictRules' | 'scarfSlope'>,
): { section: ResidualSection; verdictInput: VerdictInput; verdict: Verdict } {
  const section = residualSection({ width: m.widthMm, depth: m.depthMm, decay: m.decayMm });
  const verdictInput: VerdictInput = {
    structuralClass: ctx.structuralClass,
    sectionModulusRatio: section.sectionModulusRatio,
    areaRatio: section.areaRatio,
    affectedLengthMm: m.affectedLengthMm,
    memberLengthMm: m.memberLengthMm,
    atJointOrFitting: m.atJointOrFitting,
    severity: ctx.worstSeverity,
    activeAgent: ctx.activeAgent,
    assemblyMembersNeedingReplacement: ctx.assemblyMembersNeedingReplacement,
    // A splice whose scarfs at the workshop's slope would not fit in the member is a replacement.
    scarfLengthMm: scarfLength(m.depthMm, settings.scarfSlope),
  };
  return { section, verdictInput, verdict: recommendVerdict(verdictInput, settings.verdictRules) };
}
