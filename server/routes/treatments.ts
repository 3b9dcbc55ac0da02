import { Router } from 'express';
import type { z } from 'zod';
import { timelineQuery } from '@/shared/schemas/recheck';
import { correctTreatmentRequest, createTreatmentRequest } from '@/shared/schemas/treatment';
import { queryOf, validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import { getTimeline } from '../services/timeline';
import * as treatments from '../services/treatments';
import { getZoneStates } from '../services/zone-states';

/** Treatments (corrected by new versions, never edited or deleted), and what they mean per zone. */
export function treatmentRoutes() {
  const router = Router();

  router.get(
    '/vehicles/:vehicleId/treatments',
    requireAction('vehicles.read'),
    async (req, res) => {
      res.json({
        items: await treatments.listTreatments(memberOf(res), String(req.params.vehicleId)),
      });
    },
  );

  router.post(
    '/vehicles/:vehicleId/treatments',
    requireAction('treatments.write'),
    validate({ body: createTreatmentRequest }),
    async (req, res) => {
      const { treatment, created } = await treatments.createTreatment(
        memberOf(res),
        String(req.params.vehicleId),
        req.body,
      );
      res.status(created ? 201 : 200).json(treatment);
    },
  );

  router.get('/treatments/:treatmentId', requireAction('vehicles.read'), async (req, res) => {
    res.json(await treatments.getTreatment(memberOf(res), String(req.params.treatmentId)));
  });

  router.post(
    '/treatments/:treatmentId/corrections',
    requireAction('treatments.write'),
    validate({ body: correctTreatmentRequest }),
    async (req, res) => {
      res.json(
        await treatments.correctTreatment(memberOf(res), String(req.params.treatmentId), req.body),
      );
    },
  );

  router.get(
    '/vehicles/:vehicleId/zone-states',
    requireAction('vehicles.read'),
    async (req, res) => {
      res.json({ items: await getZoneStates(memberOf(res), String(req.params.vehicleId)) });
    },
  );

  router.get(
    '/vehicles/:vehicleId/timeline',
    requireAction('vehicles.read'),
    validate({ query: timelineQuery }),
    async (req, res) => {
      const { kinds } = queryOf<z.output<typeof timelineQuery>>(res);
      res.json({ items: await getTimeline(memberOf(res), String(req.params.vehicleId), kinds) });
    },
  );

  return router;
}
