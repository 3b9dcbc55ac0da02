import { pdfText } from './support/poppler';
import { appStorage } from '../factories/photos';
import { downloadPdf, generateReport } from '../factories/reports';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestApp, type TestApp } from './support/test-app';

// An app of its own: the verification address comes from PUBLIC_URL.
let t: TestApp;
beforeAll(() => {
  t = buildTestApp({ PUBLIC_URL: 'https://reports.example.test/' });
});
afterAll(async () => {
  await t.close();
});

describe('the verification address on a generated report', () => {
  it('prints PUBLIC_URL + /verify with the identifier on page 1', async () => {
    const s = await createVehicleScenario(t.config, appStorage(t.app), { shared: true });
    const report = await generateReport(t.app, s.inspector, s.vehicle.id, 'condition');
    const { pdf } = await downloadPdf(t.app, s.client, report);
    // A line may break after a slash of the address.
    const cover = pdfText(pdf, 1).replace(/\s+/g, ' ').replace(/\/ /g, '/');
    expect(cover).toContain(
      `enter ${report.shortId} or drop this PDF on https://reports.example.test/verify.`,
    );
  });
});
