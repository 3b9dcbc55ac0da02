import { DomainError } from '@/shared/wood';

/** The field a DomainError thrown by `fn` names; fails if `fn` throws nothing or something else. */
export function fieldOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    if (e instanceof DomainError) return e.field;
    throw e;
  }
  throw new Error('expected a DomainError');
}
