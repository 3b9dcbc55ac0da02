import { Router } from 'express';
import { saveDecisionRequest } from '@/shared/schemas/decision';
import { validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as decisions from '../services/decisions';
import { getRepairPlan } from '../services/repair-plan';

/** One member decision per zone of a vehicle; reads follow the vehicle's visibility. */
export function decisionRoutes() {
  const router = Router();
  const one = '/vehicles/:vehicleId/decisions/:zoneKey';

  router.get('/vehicles/:vehicleId/decisions', requireAction('vehicles.read'), async (req, res) => {
    res.json({
      items: await decisions.listDecisions(memberOf(res), String(req.params.vehicleId)),
    });
  });

  router.get(
    '/vehicles/:vehicleId/repair-plan',
    requireAction('vehicles.read'),
    async (req, res) => {
      res.json(await getRepairPlan(memberOf(res), String(req.params.vehicleId)));
    },
  );

  router.get(one, requireAction('vehicles.read'), async (req, res) => {
    res.json(
      await decisions.getDecision(
        memberOf(res),
        String(req.params.vehicleId),
        String(req.params.zoneKey),
      ),
    );
  });

  router.put(
    one,
    requireAction('decisions.write'),
    validate({ body: saveDecisionRequest }),
    async (req, res) => {
      const { decision, created } = await decisions.saveDecision(
        memberOf(res),
        String(req.params.vehicleId),
        String(req.params.zoneKey),
        req.body,
      );
      res.status(created ? 201 : 200).json(decision);
    },
  );

  router.delete(one, requireAction('decisions.write'), async (req, res) => {
    await decisions.deleteDecision(
      memberOf(res),
      String(req.params.vehicleId),
      String(req.params.zoneKey),
    );
    res.status(204).end();
  });

  return router;
}
