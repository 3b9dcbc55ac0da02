import { Router } from 'express';
import {
  assignRecheckRequest,
  dueListQuery,
  moveRecheckRequest,
  recordRecheckRequest,
  type DueListQuery,
} from '@/shared/schemas/recheck';
import { queryOf, validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as rechecks from '../services/rechecks';

export function recheckRoutes() {
  const router = Router();

  router.get('/vehicles/:vehicleId/rechecks', requireAction('vehicles.read'), async (req, res) => {
    res.json({
      items: await rechecks.listVehicleRechecks(memberOf(res), String(req.params.vehicleId)),
    });
  });

  // Before the `/rechecks/:recheckId/…` routes, so "due" is never read as an id.
  router.get(
    '/rechecks/due',
    requireAction('vehicles.read'),
    validate({ query: dueListQuery }),
    async (_req, res) => {
      res.json(await rechecks.dueList(memberOf(res), queryOf<DueListQuery>(res)));
    },
  );

  router.post(
    '/rechecks/:recheckId/result',
    requireAction('rechecks.write'),
    validate({ body: recordRecheckRequest }),
    async (req, res) => {
      res.json(await rechecks.recordResult(memberOf(res), String(req.params.recheckId), req.body));
    },
  );

  router.post(
    '/rechecks/:recheckId/move',
    requireAction('rechecks.write'),
    validate({ body: moveRecheckRequest }),
    async (req, res) => {
      res.json(await rechecks.moveRecheck(memberOf(res), String(req.params.recheckId), req.body));
    },
  );

  router.post(
    '/rechecks/:recheckId/assign',
    requireAction('rechecks.write'),
    validate({ body: assignRecheckRequest }),
    async (req, res) => {
      res.json(await rechecks.assignRecheck(memberOf(res), String(req.params.recheckId), req.body));
    },
  );

  router.get(
    '/rechecks/:recheckId/calendar.ics',
    requireAction('vehicles.read'),
    async (req, res) => {
      const { ics, filename } = await rechecks.recheckCalendar(
        memberOf(res),
        String(req.params.recheckId),
      );
      res.set({
        'Content-Type': 'text/calendar; charset=utf-8',
        'Content-Disposition': `attachment; filename="${filename}"`,
        'Cache-Control': 'private, no-store',
      });
      res.send(ics);
    },
  );

  return router;
}
