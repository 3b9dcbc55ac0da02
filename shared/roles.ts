/**
 * Roles and what each may do inside one workshop (PRODUCT.md §2). The server enforces
 * this table on every route; the client reads the same table only to hide controls.
 */
export const ROLES = ['owner', 'inspector', 'applicator', 'client'] as const;
export type Role = (typeof ROLES)[number];

export const ACTIONS = [
  'workshop.read',
  'workshop.update',
  'members.read',
  'members.manage',
  'audit.read',
  'vehicles.read',
  'vehicles.write',
  'vehicles.delete',
  'vehicles.share',
  'surveys.write',
  'findings.write',
  'photos.write',
  'decisions.write',
  'treatments.write',
  'rechecks.write',
  'reports.write',
  'reports.share',
] as const;
export type Action = (typeof ACTIONS)[number];

const INSPECTOR: Action[] = [
  'workshop.read',
  'members.read',
  'vehicles.read',
  'vehicles.write',
  'vehicles.share',
  'surveys.write',
  'findings.write',
  'photos.write',
  'decisions.write',
  'treatments.write',
  'rechecks.write',
  'reports.write',
  'reports.share',
];

export const PERMISSIONS: Record<Role, readonly Action[]> = {
  owner: ACTIONS,
  inspector: INSPECTOR,
  // Applicators read everything and record treatments and their re-checks.
  applicator: [
    'workshop.read',
    'members.read',
    'vehicles.read',
    'treatments.write',
    'rechecks.write',
  ],
  // Clients read only the vehicles shared with them (enforced per vehicle on the server).
  client: ['workshop.read', 'vehicles.read'],
};

export function can(role: Role | null | undefined, action: Action): boolean {
  return !!role && PERMISSIONS[role].includes(action);
}

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  inspector: 'Inspector',
  applicator: 'Applicator',
  client: 'Client',
};
