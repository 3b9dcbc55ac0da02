import { closedSaloon } from './closed-saloon';
import { openTourer } from './open-tourer';
import type { BodyPlan } from './schema';
import { timberEstate } from './timber-estate';
import { twoDoorCoupe } from './two-door-coupe';

/** Every body plan, in the order a picker shows them. */
export const BODY_PLANS: BodyPlan[] = [openTourer, closedSaloon, twoDoorCoupe, timberEstate];
