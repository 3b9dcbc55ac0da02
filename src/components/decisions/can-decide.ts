import { can, type Role } from '@/shared/roles';

/** Who may make or change a member decision (the same rule the server enforces). */
export function canDecide(role: Role): boolean {
  return can(role, 'decisions.write');
}
