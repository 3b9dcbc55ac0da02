import { Router } from 'express';
import { createSurveyRequest, updateSurveyRequest } from '@/shared/schemas/survey';
import { validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as surveys from '../services/surveys';

export function surveyRoutes() {
  const router = Router();

  router.get('/vehicles/:vehicleId/surveys', requireAction('vehicles.read'), async (req, res) => {
    res.json({ items: await surveys.listSurveys(memberOf(res), String(req.params.vehicleId)) });
  });

  router.post(
    '/vehicles/:vehicleId/surveys',
    requireAction('surveys.write'),
    validate({ body: createSurveyRequest }),
    async (req, res) => {
      const { survey, created } = await surveys.createSurvey(
        memberOf(res),
        String(req.params.vehicleId),
        req.body,
      );
      res.status(created ? 201 : 200).json(survey);
    },
  );

  router.patch(
    '/surveys/:surveyId',
    requireAction('surveys.write'),
    validate({ body: updateSurveyRequest }),
    async (req, res) => {
      res.json(await surveys.updateSurvey(memberOf(res), String(req.params.surveyId), req.body));
    },
  );

  return router;
}
