import request from 'supertest';
import { repairPlanResponse } from '@/shared/schemas/repair-plan';
import { createDecision, createStructuralDecision } from '../factories/decisions';
import { appStorage } from '../factories/photos';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

describe('GET /api/workshops/:wid/vehicles/:vid/repair-plan', () => {
  it('answers the scope as it stands: structural and cosmetic apart, totals the sums of the items', async () => {
    const s = await createVehicleScenario(t.config, appStorage(t.app), { shared: true });
    await createStructuralDecision(s.vehicle);
    await createDecision(s.vehicle, {
      zoneKey: 'sill-right',
      chosenOption: 'consolidate',
      recommendedOption: 'consolidate',
      decisionClass: 'cosmetic',
      estimatedHours: 1.5,
      labourCost: 75,
      materialCost: 10,
      totalCost: 85,
    });
    // A client the vehicle is shared with reads it too (their own car's plan).
    const res = await request(t.app)
      .get(`/api/workshops/${s.workshop.id}/vehicles/${s.vehicle.id}/repair-plan`)
      .set(s.client.auth)
      .expect(200);
    const plan = repairPlanResponse.strict().parse(res.body);

    expect(plan.structural.map((i) => i.zoneKey)).toEqual(['sill-left']);
    expect(plan.cosmetic.map((i) => i.zoneKey)).toEqual(['sill-right']);
    expect(plan.structural[0]).toMatchObject({ hours: 6, totalCost: 380 });
    expect(plan.totals.structural).toEqual({ count: 1, hours: 6, totalCost: 380 });
    expect(plan.totals.cosmetic).toEqual({ count: 1, hours: 1.5, totalCost: 85 });
    const items = [...plan.structural, ...plan.cosmetic];
    expect(plan.totals.hours).toBeCloseTo(sum(items.map((i) => i.hours)), 6);
    expect(plan.totals.totalCost).toBeCloseTo(sum(items.map((i) => i.totalCost)), 6);
    // Frame work comes before anything it carries.
    expect(plan.workOrder.length).toBeGreaterThan(0);
    expect(plan.condition.grade).toBeTruthy();
  });
});
