import { ROLE_LABELS, ROLES, type Role } from '@/shared/roles';
import type { Option } from '@/src/components/ui';

const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: 'Everything in the workshop, including members, settings and removals.',
  inspector: 'Adds vehicles, records surveys, findings and photos, shares vehicles.',
  applicator: 'Reads every vehicle; records treatments and re-checks.',
  client: 'Sees only the vehicles shared with them.',
};

export const ROLE_OPTIONS: Option<Role>[] = ROLES.map((r) => ({
  value: r,
  label: ROLE_LABELS[r],
  description: ROLE_DESCRIPTIONS[r],
}));
