import type { Config } from '@/server/config';
import type { StorageAdapter } from '@/server/storage';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from './index';
import { createPhoto } from './photos';

/**
 * A workshop with its team and one vehicle carrying a survey, a finding and a photo: the
 * records every vehicle-scoped route can be pointed at. `shared` gives the team's client access.
 */
export async function createVehicleScenario(
  config: Config,
  storage: StorageAdapter,
  opts: { shared?: boolean; vehicle?: Parameters<typeof createVehicle>[1] } = {},
) {
  const team = await createWorkshopWithTeam(config);
  const vehicle = await createVehicle(team.workshop, opts.vehicle);
  if (opts.shared) await grantAccess(vehicle, team.client.user.id);
  const survey = await createSurvey(vehicle);
  const finding = await createFinding(survey);
  const photo = await createPhoto(finding, storage);
  return { ...team, vehicle, survey, finding, photo };
}
