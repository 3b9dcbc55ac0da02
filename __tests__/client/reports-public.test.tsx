import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import SharedReport from '@/app/shared/[token]';
import VerifyScreen from '@/app/verify';
import { VerifyResult } from '@/src/components/reports/verify-result';
import type { PublicShareResponse, VerifyResponse } from '@/shared/schemas/report';
import { ApiRequestError, request } from '@/src/api/client';
import { buildSummary } from './fixtures/reports';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('expo-router', () => {
  const { Text } = jest.requireActual('react-native');
  return {
    useLocalSearchParams: jest.fn(),
    Link: ({ children }: { children: React.ReactNode }) => <Text>{children}</Text>,
  };
});

const mockRequest = request as jest.MockedFunction<typeof request>;
const { useLocalSearchParams } = jest.requireMock('expo-router');
const TOKEN = 'k7dQ2mX9vN4pR8sT1wY6zB3cF5gH0jL2aE9uI7oP4qW';

function publicShare(over: Partial<PublicShareResponse['report']> = {}): PublicShareResponse {
  return {
    report: {
      kind: 'repair-scope',
      version: 2,
      shortId: 'SF-7K3M-Q9TD',
      generatedAt: '2026-11-20T09:00:00.000Z',
      sha256: 'cd'.repeat(32),
      pageCount: 6,
      byteSize: 1_468_006,
      newerVersionExists: false,
      ...over,
    },
    summary: buildSummary({
      kind: 'repair-scope',
      totals: { hours: 26.5, totalCost: 1480, currency: 'EUR' },
    }),
    expiresAt: '2026-12-04T09:00:00.000Z',
    pdfUrl: `/api/public/shares/${TOKEN}/pdf`,
  };
}

beforeEach(() => {
  mockRequest.mockReset();
  jest.clearAllMocks();
});

describe('public share page', () => {
  it('draws the body with the report’s severities; tapping a member names it, nothing opens', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    mockRequest.mockResolvedValue(publicShare());
    render(<SharedReport />, { wrapper: TestProviders });
    expect(await screen.findByTestId('public-body-diagram')).toBeOnTheScreen();
    expect(screen.getByTestId('public-diagram-zone')).toHaveTextContent(/Tap a member/);
    fireEvent.press(screen.getByTestId('zone-sill-left'));
    expect(screen.getByTestId('public-diagram-zone')).toHaveTextContent(
      /^Left sill: worst severity 3, 2 findings\.$/,
    );
    fireEvent.press(screen.getByTestId('zone-hinge-pillar-front-left'));
    expect(screen.getByTestId('public-diagram-zone')).toHaveTextContent(/: nothing recorded\.$/);
    expect(mockRequest).toHaveBeenCalledTimes(1);
  });

  it('leaves the drawing out for a report stored without one', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    mockRequest.mockResolvedValue({ ...publicShare(), summary: buildSummary({ diagram: null }) });
    render(<SharedReport />, { wrapper: TestProviders });
    expect(await screen.findByTestId('public-vehicle')).toBeOnTheScreen();
    expect(screen.queryByTestId('public-diagram')).toBeNull();
  });

  it('shows the summary the PDF prints, the download and the verification line, without a session', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    mockRequest.mockResolvedValue(publicShare());
    render(<SharedReport />, { wrapper: TestProviders });

    expect(await screen.findByTestId('public-vehicle')).toHaveTextContent('1931 Halvard Tourer');
    expect(mockRequest).toHaveBeenCalledWith(
      'GET',
      `/api/public/shares/${TOKEN}`,
      expect.anything(),
    );
    expect(mockRequest).toHaveBeenCalledTimes(1);
    expect(screen.getByTestId('public-report-line')).toHaveTextContent(
      'Repair scope · version 2 · 20 Nov 2026 · SF-7K3M-Q9TD',
    );
    expect(screen.getByTestId('public-grade')).toHaveTextContent(/Needs repair \(grade 3 of 5/);
    expect(screen.getByTestId('public-primary')).toHaveTextContent(/9 of 12 \(75 %\)/);
    expect(screen.getByTestId('public-must-fix')).toHaveTextContent(
      /Left sill: Splice in new timber/,
    );
    expect(screen.getByTestId('public-must-fix')).toHaveTextContent(
      /Right lock pillar: Replace the member/,
    );
    expect(screen.getByTestId('public-infestations')).toHaveTextContent(
      /Rear cross-member: Treated, watching/,
    );
    expect(screen.getByTestId('public-not-inspected')).toHaveTextContent(
      /Roof framing above the headliner/,
    );
    expect(screen.getByTestId('public-totals')).toHaveTextContent(/26.5 h of work/);
    expect(screen.getByTestId('public-inspector')).toHaveTextContent(
      'Inspected by Ines Varga on 14 Oct 2026.',
    );
    expect(screen.getByTestId('public-verify-line')).toHaveTextContent(/enter SF-7K3M-Q9TD/);
    expect(screen.getByTestId('public-download')).toBeTruthy();
    expect(screen.queryByTestId('public-newer')).toBeNull();
  });

  it('says when a newer version exists', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    mockRequest.mockResolvedValue(publicShare({ newerVersionExists: true }));
    render(<SharedReport />, { wrapper: TestProviders });
    expect(await screen.findByTestId('public-newer')).toHaveTextContent(/A newer version/);
  });

  it('with no structural repair listed, says so and how many damaged zones await a decision', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    const answer = publicShare();
    answer.summary = buildSummary({
      mustFix: [],
      condition: { ...answer.summary.condition, undecidedZones: 2 },
    });
    mockRequest.mockResolvedValue(answer);
    render(<SharedReport />, { wrapper: TestProviders });
    expect(await screen.findByTestId('public-must-fix')).toHaveTextContent(
      /No structural repair is listed in this report. 2 damaged zones still await/,
    );
  });

  it('a withdrawn or expired link gets one calm page with no details', async () => {
    useLocalSearchParams.mockReturnValue({ token: TOKEN });
    mockRequest.mockRejectedValue(new ApiRequestError(404, 'not_found', 'Share not found'));
    render(<SharedReport />, { wrapper: TestProviders });
    expect(await screen.findByTestId('shared-unavailable')).toHaveTextContent(
      'This link is no longer available',
    );
    expect(screen.queryByTestId('public-summary')).toBeNull();
    expect(screen.queryByText(/Share not found/)).toBeNull();
  });
});

describe('verify page', () => {
  const report = {
    shortId: 'SF-7K3M-Q9TD',
    kind: 'condition' as const,
    version: 1,
    latestVersion: 2,
    newerVersionExists: true,
    generatedAt: '2026-11-20T09:00:00.000Z',
    sha256: 'ef'.repeat(32),
    workshopName: 'Larchmere Coachworks',
  };

  it('refuses a malformed identifier beside the field and sends nothing', async () => {
    useLocalSearchParams.mockReturnValue({});
    render(<VerifyScreen />, { wrapper: TestProviders });
    fireEvent.changeText(screen.getByTestId('verify-id'), 'SF-1234');
    fireEvent.press(screen.getByTestId('verify-id-submit'));
    expect(await screen.findByTestId('verify-id-error')).toHaveTextContent(
      'A report identifier looks like SF-7K3M-Q9TD',
    );
    expect(mockRequest).not.toHaveBeenCalled();
    // The file check is a web feature; native says so in words.
    expect(screen.getByTestId('verify-file-native')).toHaveTextContent(/web browser/);
  });

  it('looks up an identifier typed in lower case and says an older version was found', async () => {
    useLocalSearchParams.mockReturnValue({});
    const answer: VerifyResponse = {
      genuine: true,
      matchedBy: 'id',
      claimedShortId: null,
      report,
      message: 'A report with this identifier was issued.',
    };
    mockRequest.mockResolvedValue(answer);
    render(<VerifyScreen />, { wrapper: TestProviders });
    fireEvent.changeText(screen.getByTestId('verify-id'), ' sf-7k3m-q9td ');
    fireEvent.press(screen.getByTestId('verify-id-submit'));
    expect(await screen.findByTestId('verify-outcome')).toHaveTextContent(
      'This identifier belongs to a real report',
    );
    expect(mockRequest).toHaveBeenCalledWith(
      'GET',
      '/api/public/verify/SF-7K3M-Q9TD',
      expect.anything(),
    );
    expect(screen.getByTestId('verify-version')).toHaveTextContent(
      'Version 1 of 2: a newer version exists.',
    );
    expect(screen.getByTestId('verify-report')).toHaveTextContent(/issued by Larchmere Coachworks/);
  });

  it('an identifier that was never issued is told as not genuine', async () => {
    useLocalSearchParams.mockReturnValue({ id: 'SF-7K3M-Q9TD' });
    mockRequest.mockResolvedValue({
      genuine: false,
      matchedBy: null,
      claimedShortId: null,
      report: null,
      message: 'No report with the identifier SF-7K3M-Q9TD was issued.',
    });
    render(<VerifyScreen />, { wrapper: TestProviders });
    // The share page links here with the identifier filled in.
    expect(screen.getByTestId('verify-id')).toHaveProp('value', 'SF-7K3M-Q9TD');
    fireEvent.press(screen.getByTestId('verify-id-submit'));
    expect(await screen.findByTestId('verify-outcome')).toHaveTextContent(
      'Not genuine: no report has this identifier',
    );
    expect(screen.getByTestId('verify-message')).toHaveTextContent(/was issued/);
    expect(screen.queryByTestId('verify-report')).toBeNull();
  });

  it.each([
    [
      {
        genuine: true,
        matchedBy: 'hash',
        claimedShortId: null,
        report: { ...report, newerVersionExists: false, latestVersion: 1 },
      },
      'Genuine and unchanged',
      'Version 1, the newest.',
    ],
    [
      { genuine: true, matchedBy: 'hash', claimedShortId: null, report },
      'Genuine and unchanged',
      'Version 1 of 2: a newer version exists.',
    ],
    [
      { genuine: false, matchedBy: null, claimedShortId: 'SF-7K3M-Q9TD', report: null },
      'Changed: this file differs from the report that was issued',
      null,
    ],
    [
      { genuine: false, matchedBy: null, claimedShortId: null, report: null },
      'Not genuine: this file matches no issued report',
      null,
    ],
  ] as const)('a file check %# is told in words: %s', (answer, headline, version) => {
    render(<VerifyResult result={{ ...answer, message: 'From the server.' }} checkedBy="file" />);
    expect(screen.getByTestId('verify-outcome')).toHaveTextContent(headline);
    expect(screen.getByTestId('verify-message')).toHaveTextContent('From the server.');
    if (version) expect(screen.getByTestId('verify-version')).toHaveTextContent(version);
    else expect(screen.queryByTestId('verify-report')).toBeNull();
  });

  it('a server error is shown in plain words', async () => {
    useLocalSearchParams.mockReturnValue({ id: 'SF-7K3M-Q9TD' });
    mockRequest.mockRejectedValue(new ApiRequestError(500, 'internal', 'boom'));
    render(<VerifyScreen />, { wrapper: TestProviders });
    fireEvent.press(screen.getByTestId('verify-id-submit'));
    await waitFor(() =>
      expect(screen.getByTestId('verify-error')).toHaveTextContent(
        /Something went wrong on the server/,
      ),
    );
    expect(screen.queryByTestId('verify-result')).toBeNull();
  });
});
