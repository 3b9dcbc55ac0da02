import { Router, type Request, type Response } from 'express';
import {
  createVehicleRequest,
  grantVehicleAccessRequest,
  updateVehicleRequest,
  vehicleListQuery,
} from '@/shared/schemas/vehicle';
import type { z } from 'zod';
import { validate, queryOf } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as access from '../services/vehicle-access';
import * as vehicles from '../services/vehicles';

const vid = (req: Request) => String(req.params.vehicleId);

export function vehicleRoutes() {
  const router = Router();

  router.get(
    '/vehicles',
    requireAction('vehicles.read'),
    validate({ query: vehicleListQuery }),
    async (_req, res: Response) => {
      res.json({
        items: await vehicles.listVehicles(
          memberOf(res),
          queryOf<z.output<typeof vehicleListQuery>>(res),
        ),
      });
    },
  );

  router.post(
    '/vehicles',
    requireAction('vehicles.write'),
    validate({ body: createVehicleRequest }),
    async (req, res) => {
      const { vehicle, created } = await vehicles.createVehicle(memberOf(res), req.body);
      res.status(created ? 201 : 200).json(vehicle);
    },
  );

  router.get('/vehicles/:vehicleId', requireAction('vehicles.read'), async (req, res) => {
    res.json(await vehicles.getVehicle(memberOf(res), vid(req)));
  });

  router.patch(
    '/vehicles/:vehicleId',
    requireAction('vehicles.write'),
    validate({ body: updateVehicleRequest }),
    async (req, res) => {
      res.json(await vehicles.updateVehicle(memberOf(res), vid(req), req.body));
    },
  );

  router.delete('/vehicles/:vehicleId', requireAction('vehicles.delete'), async (req, res) => {
    await vehicles.deleteVehicle(memberOf(res), vid(req));
    res.status(204).end();
  });

  router.post(
    '/vehicles/:vehicleId/restore',
    requireAction('vehicles.delete'),
    async (req, res) => {
      res.json(await vehicles.restoreVehicle(memberOf(res), vid(req)));
    },
  );

  router.get('/vehicles/:vehicleId/access', requireAction('vehicles.share'), async (req, res) => {
    res.json({ items: await access.listAccess(memberOf(res), vid(req)) });
  });

  router.post(
    '/vehicles/:vehicleId/access',
    requireAction('vehicles.share'),
    validate({ body: grantVehicleAccessRequest }),
    async (req, res) => {
      const { access: row, created } = await access.grantAccess(
        memberOf(res),
        vid(req),
        req.body.userId,
      );
      res.status(created ? 201 : 200).json(row);
    },
  );

  router.delete(
    '/vehicles/:vehicleId/access/:userId',
    requireAction('vehicles.share'),
    async (req, res) => {
      await access.revokeAccess(memberOf(res), vid(req), String(req.params.userId));
      res.status(204).end();
    },
  );

  return router;
}
