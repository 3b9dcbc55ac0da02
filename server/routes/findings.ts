import { Router } from 'express';
import type { z } from 'zod';
import {
  createFindingRequest,
  findingListQuery,
  updateFindingRequest,
} from '@/shared/schemas/finding';
import { queryOf, validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as findings from '../services/findings';

export function findingRoutes() {
  const router = Router();

  router.get(
    '/vehicles/:vehicleId/findings',
    requireAction('vehicles.read'),
    validate({ query: findingListQuery }),
    async (req, res) => {
      const query = queryOf<z.output<typeof findingListQuery>>(res);
      res.json({
        items: await findings.listFindings(memberOf(res), String(req.params.vehicleId), query),
      });
    },
  );

  router.post(
    '/surveys/:surveyId/findings',
    requireAction('findings.write'),
    validate({ body: createFindingRequest }),
    async (req, res) => {
      const { finding, created } = await findings.createFinding(
        memberOf(res),
        String(req.params.surveyId),
        req.body,
      );
      res.status(created ? 201 : 200).json(finding);
    },
  );

  router.get('/findings/:findingId', requireAction('vehicles.read'), async (req, res) => {
    res.json(await findings.getFinding(memberOf(res), String(req.params.findingId)));
  });

  router.patch(
    '/findings/:findingId',
    requireAction('findings.write'),
    validate({ body: updateFindingRequest }),
    async (req, res) => {
      res.json(await findings.updateFinding(memberOf(res), String(req.params.findingId), req.body));
    },
  );

  router.delete('/findings/:findingId', requireAction('findings.write'), async (req, res) => {
    await findings.deleteFinding(memberOf(res), String(req.params.findingId));
    res.status(204).end();
  });

  router.post('/findings/:findingId/restore', requireAction('findings.write'), async (req, res) => {
    res.json(await findings.restoreFinding(memberOf(res), String(req.params.findingId)));
  });

  return router;
}
