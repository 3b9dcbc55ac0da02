import { fireEvent, render, screen, waitFor, within } from '@testing-library/react-native';
import { Linking } from 'react-native';
import ReportScreen from '@/app/(app)/vehicles/[vehicleId]/reports/[reportId]';
import VehicleReports from '@/app/(app)/vehicles/[vehicleId]/reports';
import type { Role } from '@/shared/roles';
import type { ReportResponse, ShareResponse } from '@/shared/schemas/report';
import { ApiRequestError, request } from '@/src/api/client';
import { useRole } from '@/src/hooks/use-session';
import { buildReport, buildShare, VID, WID, withToken } from './fixtures/reports';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('@/src/hooks/use-session', () => ({
  useWorkshopId: () => '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f',
  useRole: jest.fn(),
}));
jest.mock('expo-router', () => ({
  router: { push: jest.fn() },
  useLocalSearchParams: jest.fn(),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const mockRole = useRole as jest.MockedFunction<typeof useRole>;
const { router, useLocalSearchParams } = jest.requireMock('expo-router');
const VEHICLE = {
  id: VID,
  year: 1927,
  make: 'Aldermoor',
  model: 'Fourteen Tourer',
  bodyPlanKey: 'tourer-4door',
};
const LIST = `/api/workshops/${WID}/vehicles/${VID}/reports`;
const calls = (method: string, path: string) =>
  mockRequest.mock.calls.filter(([m, p]) => m === method && p === path);

/** A server whose report list the test changes between polls. */
function serveReports(role: Role, list: () => ReportResponse[]) {
  mockRole.mockReturnValue(role);
  useLocalSearchParams.mockReturnValue({ vehicleId: VID });
  mockRequest.mockImplementation(async (method, path) => {
    if (method === 'GET' && path === LIST) return { items: list() };
    if (method === 'GET' && path === `/api/workshops/${WID}/vehicles/${VID}`) return VEHICLE;
    throw new Error(`unexpected ${method} ${path}`);
  });
}

beforeEach(() => {
  mockRequest.mockReset();
  jest.clearAllMocks();
});

describe('vehicle reports screen', () => {
  it('an inspector generates a buyer’s report and follows it from progress to ready', async () => {
    let items: ReportResponse[] = [];
    serveReports('inspector', () => items);
    const queued = buildReport({
      status: 'rendering',
      progress: 40,
      stage: 'Drawing the body diagram',
      summary: null,
      pdfUrl: null,
      byteSize: null,
      pageCount: null,
      sha256: null,
      finishedAt: null,
    });
    const base = mockRequest.getMockImplementation()!;
    mockRequest.mockImplementation(async (method, path, opts) => {
      if (method === 'POST' && path === LIST) {
        items = [queued];
        return queued;
      }
      return base(method, path, opts);
    });
    render(<VehicleReports />, { wrapper: TestProviders });

    expect(await screen.findByTestId('reports-empty')).toHaveTextContent(/No reports yet/);
    expect(screen.getByTestId('report-card-repair-scope')).toHaveTextContent(/Repair scope/);
    expect(screen.getByTestId('report-none-condition')).toBeTruthy();
    fireEvent.press(screen.getByTestId('report-generate-condition'));

    await waitFor(() => expect(calls('POST', LIST)).toHaveLength(1));
    const body = (calls('POST', LIST)[0][2] as { body: { kind: string; id: string } }).body;
    expect(body.kind).toBe('condition');
    expect(body.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(await screen.findByTestId('report-progress-condition-stage')).toHaveTextContent(
      '40 % · Drawing the body diagram',
    );
    expect(screen.getByTestId('report-status-condition')).toHaveTextContent('Being prepared');
    expect(screen.getByTestId('report-generate-condition')).toBeDisabled();

    // The list polls while a version is being prepared; the next answer has it ready.
    items = [buildReport({ id: queued.id })];
    expect(
      await screen.findByTestId('report-grade-condition', {}, { timeout: 4000 }),
    ).toHaveTextContent(/^Needs repair \(grade 3 of 5\)Sound in most members/);
    expect(screen.getByTestId('report-facts-condition')).toHaveTextContent(
      /SF-7K3M-Q9TD · 20 Nov 2026 · 212 KB · 3 pages/,
    );
    expect(screen.queryByTestId('report-progress-condition')).toBeNull();
    fireEvent.press(screen.getByTestId('report-share-condition'));
    expect(router.push).toHaveBeenCalledWith({
      pathname: '/vehicles/[vehicleId]/reports/[reportId]',
      params: { vehicleId: VID, reportId: queued.id },
    });
  });

  it('a client sees the reports shared with them and older versions, but cannot generate or share', async () => {
    const v2 = buildReport({ kind: 'repair-scope', version: 2, shortId: 'SF-AAAA-BBBB' });
    const v1 = buildReport({
      kind: 'repair-scope',
      version: 1,
      shortId: 'SF-CCCC-DDDD',
      latest: false,
    });
    serveReports('client', () => [v2, v1]);
    const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
    render(<VehicleReports />, { wrapper: TestProviders });

    expect(await screen.findByTestId('report-shortid-repair-scope')).toHaveTextContent(
      'SF-AAAA-BBBB',
    );
    expect(screen.queryByTestId('report-generate-repair-scope')).toBeNull();
    expect(screen.queryByTestId('report-generate-condition')).toBeNull();
    expect(screen.queryByTestId('report-share-repair-scope')).toBeNull();
    const older = screen.getByTestId('report-older-repair-scope');
    expect(within(older).getByTestId(`report-version-${v1.id}`)).toHaveTextContent(
      /Version 1 .* SF-CCCC-DDDD/,
    );
    fireEvent.press(within(older).getByTestId(`report-download-${v1.id}`));
    expect(open).toHaveBeenCalledWith(v1.pdfUrl);
  });

  it('too many reports in preparation (429) shows the server’s words with the limit, not “too many attempts”', async () => {
    serveReports('owner', () => []);
    const base = mockRequest.getMockImplementation()!;
    mockRequest.mockImplementation(async (method, path, opts) => {
      if (method === 'POST')
        throw new ApiRequestError(
          429,
          'rate_limited',
          'This workshop already has 3 reports being generated, the most allowed at once.',
        );
      return base(method, path, opts);
    });
    render(<VehicleReports />, { wrapper: TestProviders });
    fireEvent.press(await screen.findByTestId('report-generate-repair-scope'));
    expect(await screen.findByTestId('report-error-repair-scope')).toHaveTextContent(
      'This workshop already has 3 reports being generated, the most allowed at once.',
    );
    expect(screen.getByTestId('report-error-repair-scope')).not.toHaveTextContent(/attempts/);
    expect(screen.queryByTestId('report-error-condition')).toBeNull();
  });
});

describe('share screen', () => {
  const report = buildReport();
  const SHARES = `/api/workshops/${WID}/reports/${report.id}/shares`;

  function serveShares(shares: () => ShareResponse[], onCreate?: (body: unknown) => ShareResponse) {
    mockRole.mockReturnValue('inspector');
    useLocalSearchParams.mockReturnValue({ vehicleId: VID, reportId: report.id });
    mockRequest.mockImplementation(async (method, path, opts) => {
      if (method === 'GET' && path === `/api/workshops/${WID}/reports/${report.id}`) return report;
      if (method === 'GET' && path === SHARES) return { items: shares() };
      if (method === 'POST' && path === SHARES && onCreate)
        return withToken(onCreate((opts as { body: unknown }).body), 'tok_abc123');
      throw new Error(`unexpected ${method} ${path}`);
    });
  }

  it('days outside 1–90 or not a number are refused beside the field and nothing is sent', async () => {
    serveShares(() => []);
    render(<ReportScreen />, { wrapper: TestProviders });
    const days = await screen.findByTestId('share-days');
    expect(days).toHaveProp('value', '14');
    expect(screen.getByTestId('share-note')).toHaveTextContent(/Anyone with the link can read/);

    fireEvent.changeText(days, '91');
    fireEvent.press(screen.getByTestId('share-submit'));
    expect(await screen.findByTestId('share-days-error')).toHaveTextContent('At most 90 days');
    fireEvent.changeText(days, 'two');
    fireEvent.press(screen.getByTestId('share-submit'));
    await waitFor(() =>
      expect(screen.getByTestId('share-days-error')).toHaveTextContent('Whole days, from 1 to 90'),
    );
    fireEvent.changeText(days, '7');
    fireEvent.changeText(screen.getByTestId('share-email'), 'not-an-address');
    fireEvent.press(screen.getByTestId('share-submit'));
    expect(await screen.findByTestId('share-email-error')).toHaveTextContent(
      'Enter a valid e-mail address',
    );
    expect(screen.queryByTestId('share-days-error')).toBeNull();
    expect(calls('POST', SHARES)).toHaveLength(0);
  });

  it('sharing by e-mail sends the form, shows the link once and says the e-mail went out', async () => {
    let shares: ShareResponse[] = [];
    serveShares(
      () => shares,
      (body) => {
        const s = buildShare({ reportId: report.id, recipientEmail: 'buyer@example.test' });
        shares = [s];
        expect(body).toEqual({
          recipientEmail: 'buyer@example.test',
          expiresInDays: 30,
          message: 'As promised.',
        });
        return s;
      },
    );
    render(<ReportScreen />, { wrapper: TestProviders });
    expect(await screen.findByTestId('share-list-empty')).toBeTruthy();
    fireEvent.changeText(screen.getByTestId('share-email'), ' Buyer@Example.test ');
    fireEvent.changeText(screen.getByTestId('share-days'), '30');
    fireEvent.changeText(screen.getByTestId('share-message'), 'As promised.');
    fireEvent.press(screen.getByTestId('share-submit'));

    expect(await screen.findByTestId('share-link')).toHaveTextContent(
      'http://127.0.0.1:8080/shared/tok_abc123',
    );
    expect(screen.getByTestId('share-emailed')).toHaveTextContent(
      'E-mailed to buyer@example.test.',
    );
    expect(calls('POST', SHARES)).toHaveLength(1);
    // The list is refetched after the write and shows the new link.
    expect(await screen.findByTestId(`share-row-${shares[0].id}`)).toHaveTextContent(
      /buyer@example.test/,
    );
    expect(screen.getByTestId(`share-views-${shares[0].id}`)).toHaveTextContent(
      'Opened 0 times · PDF not downloaded',
    );
    // No clipboard on native: the link stays on screen to be copied by hand.
    fireEvent.press(screen.getByTestId('share-copy'));
    expect(await screen.findByTestId('share-copy-fallback')).toBeTruthy();
  });

  it('withdrawing a link asks first, then revokes it and lists it as withdrawn', async () => {
    let share = buildShare({
      reportId: report.id,
      viewCount: 3,
      lastViewedAt: '2026-11-21T10:15:00.000Z',
      downloadCount: 1,
    });
    serveShares(() => [share]);
    const base = mockRequest.getMockImplementation()!;
    const REVOKE = `/api/workshops/${WID}/shares/${share.id}/revoke`;
    mockRequest.mockImplementation(async (method, path, opts) => {
      if (method === 'POST' && path === REVOKE) {
        share = { ...share, status: 'revoked', revokedAt: '2026-11-22T08:00:00.000Z' };
        return share;
      }
      return base(method, path, opts);
    });
    render(<ReportScreen />, { wrapper: TestProviders });
    expect(await screen.findByTestId(`share-views-${share.id}`)).toHaveTextContent(
      /^Opened 3 times, last on 21 Nov 2026, 05:15 · PDF downloaded once$/,
    );
    fireEvent.press(screen.getByTestId(`share-revoke-${share.id}`));
    expect(screen.getByTestId('confirm-dialog')).toHaveTextContent(
      /buyer@example.test will no longer/,
    );
    fireEvent.press(screen.getByTestId('confirm-cancel'));
    expect(calls('POST', REVOKE)).toHaveLength(0);

    fireEvent.press(screen.getByTestId(`share-revoke-${share.id}`));
    fireEvent.press(screen.getByTestId('confirm-ok'));
    await waitFor(() => expect(calls('POST', REVOKE)).toHaveLength(1));
    await waitFor(() =>
      expect(screen.getByTestId(`share-status-${share.id}`)).toHaveTextContent('Withdrawn'),
    );
    expect(screen.queryByTestId(`share-revoke-${share.id}`)).toBeNull();
  });
});
