import { Router, type Response } from 'express';
import { createReportRequest, createShareRequest } from '@/shared/schemas/report';
import { appUrlOf, depsOf } from '../app';
import { reportQueueOf } from '../jobs/report-queue';
import { validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as shares from '../services/report-shares';
import * as reports from '../services/reports';

export function sendPdf(res: Response, file: { pdf: Buffer; fileName: string }) {
  res
    .status(200)
    .type('application/pdf')
    .setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`)
    .setHeader('Cache-Control', 'private, no-store')
    .send(file.pdf);
}

/** Generated reports (a job makes the PDF), their downloads and their share links. */
export function reportRoutes() {
  const router = Router();

  router.get('/vehicles/:vehicleId/reports', requireAction('vehicles.read'), async (req, res) => {
    res.json({ items: await reports.listReports(memberOf(res), String(req.params.vehicleId)) });
  });

  router.post(
    '/vehicles/:vehicleId/reports',
    requireAction('reports.write'),
    validate({ body: createReportRequest }),
    async (req, res) => {
      const { report, created } = await reports.createReport(
        memberOf(res),
        String(req.params.vehicleId),
        req.body,
        { queue: reportQueueOf(req), maxInFlight: depsOf(req).config.reports.maxInFlight },
      );
      res.status(created ? 202 : 200).json(report);
    },
  );

  router.get('/reports/:reportId', requireAction('vehicles.read'), async (req, res) => {
    res.json(await reports.getReport(memberOf(res), String(req.params.reportId)));
  });

  router.get('/reports/:reportId/pdf', requireAction('vehicles.read'), async (req, res) => {
    sendPdf(
      res,
      await reports.downloadReport(memberOf(res), String(req.params.reportId), depsOf(req).storage),
    );
  });

  router.get('/reports/:reportId/shares', requireAction('reports.share'), async (req, res) => {
    res.json({ items: await shares.listShares(memberOf(res), String(req.params.reportId)) });
  });

  router.post(
    '/reports/:reportId/shares',
    requireAction('reports.share'),
    validate({ body: createShareRequest }),
    async (req, res) => {
      const share = await shares.createShare(memberOf(res), String(req.params.reportId), req.body, {
        mailer: depsOf(req).mailer,
        appUrl: appUrlOf(req),
      });
      res.status(201).json(share);
    },
  );

  router.post('/shares/:shareId/revoke', requireAction('reports.share'), async (req, res) => {
    res.json(await shares.revokeShare(memberOf(res), String(req.params.shareId)));
  });

  return router;
}
