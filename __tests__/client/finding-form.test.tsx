import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import type { FindingResponse } from '@/shared/schemas';
import { ApiRequestError, request } from '@/src/api/client';
import { FindingEditor, type FindingEditorMode } from '@/src/components/findings/finding-editor';
import { ToastProvider } from '@/src/components/ui';
import { fixturePlan } from './fixtures/fixture-plan';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('expo-image-picker', () => ({
  launchImageLibraryAsync: jest.fn(),
  launchCameraAsync: jest.fn(),
  requestCameraPermissionsAsync: jest.fn(async () => ({ granted: true })),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const WID = '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f';
const SID = '7b8c9d0e-1f2a-4b3c-9d4e-5f6a7b8c9d0e';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

function finding(over: Partial<FindingResponse> = {}): FindingResponse {
  return {
    id: '0f1e2d3c-4b5a-4678-9abc-def012345678',
    surveyId: SID,
    vehicleId: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f',
    surveyDate: '2025-03-14',
    zoneKey: 'left-sill',
    severity: 2,
    decayType: 'none',
    insectEvidence: [],
    holeDiameterMm: null,
    activity: 'unknown',
    moisture: null,
    pickTest: 'not-done',
    decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
    affectedLengthMm: null,
    atJointOrFitting: false,
    pin: null,
    notes: '',
    photos: [],
    authorName: 'Ines Varga',
    version: 3,
    createdAt: '2025-03-14T10:00:00.000Z',
    updatedAt: '2025-03-14T10:00:00.000Z',
    deletedAt: null,
    ...over,
  };
}

function wrapper({ children }: { children: ReactNode }) {
  // No retries, and no garbage-collection timers left running after a test.
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity },
      mutations: { retry: false, gcTime: Infinity },
    },
  });
  return (
    <SafeAreaProvider
      initialMetrics={{
        frame: { x: 0, y: 0, width: 390, height: 844 },
        insets: { top: 0, left: 0, right: 0, bottom: 0 },
      }}
    >
      <QueryClientProvider client={queryClient}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}

function renderEditor(mode: FindingEditorMode, role: 'inspector' | 'client' = 'inspector') {
  const onDone = jest.fn();
  render(<FindingEditor wid={WID} plan={fixturePlan} role={role} mode={mode} onDone={onDone} />, {
    wrapper,
  });
  return { onDone };
}

const newMode: FindingEditorMode = {
  kind: 'new',
  surveyId: SID,
  zoneKey: 'left-sill',
  pin: { view: 'left', x: 500, y: 315 },
};

beforeEach(() => mockRequest.mockReset());

describe('FindingEditor, new finding', () => {
  it('sends severity 3 and frass to the survey’s findings, with a client id and the tapped pin', async () => {
    mockRequest.mockImplementation(
      async (_m, _p, o) => finding({ ...(o?.body as object), version: 0 }) as never,
    );
    const { onDone } = renderEditor(newMode);

    fireEvent.press(screen.getByTestId('severity-3'));
    fireEvent.press(screen.getByTestId('evidence-frass-powder'));
    fireEvent.press(screen.getByTestId('finding-save'));

    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(mockRequest).toHaveBeenCalledTimes(1);
    const [method, path, options] = mockRequest.mock.calls[0];
    expect(method).toBe('POST');
    expect(path).toBe(`/api/workshops/${WID}/surveys/${SID}/findings`);
    expect(options?.body).toMatchObject({
      id: expect.stringMatching(UUID),
      zoneKey: 'left-sill',
      severity: 3,
      insectEvidence: ['frass-powder'],
      pin: { view: 'left', x: 500, y: 315 },
      moisture: null,
    });
  });

  it('shows the server’s message for severity beside the severity choices', async () => {
    mockRequest.mockRejectedValue(
      new ApiRequestError(400, 'validation_failed', 'Some fields are not valid', {
        severity: 'Severity must be a whole number from 0 to 4',
      }),
    );
    const { onDone } = renderEditor(newMode);
    fireEvent.press(screen.getByTestId('severity-3'));
    fireEvent.press(screen.getByTestId('finding-save'));

    expect(await screen.findByTestId('severity-error')).toHaveTextContent(
      'Severity must be a whole number from 0 to 4',
    );
    expect(onDone).not.toHaveBeenCalled();
  });

  it('asks for a severity before sending anything', async () => {
    renderEditor(newMode);
    fireEvent.press(screen.getByTestId('finding-save'));
    expect(await screen.findByTestId('severity-error')).toHaveTextContent(
      'Choose a severity from 0 to 4',
    );
    expect(mockRequest).not.toHaveBeenCalled();
  });

  it('sends the moisture reading with the zone’s default species', async () => {
    mockRequest.mockImplementation(
      async (_m, _p, o) => finding({ ...(o?.body as object) }) as never,
    );
    const { onDone } = renderEditor(newMode);
    fireEvent.press(screen.getByTestId('severity-1'));
    fireEvent.changeText(screen.getByTestId('finding-meter'), '23,5');
    fireEvent.changeText(screen.getByTestId('finding-wood-temp'), '14');
    fireEvent.press(screen.getByTestId('finding-save'));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(mockRequest.mock.calls[0][2]?.body).toMatchObject({
      moisture: { meterReading: 23.5, woodTempC: 14, species: 'white-ash' },
    });
  });
});

describe('FindingEditor, photos after saving', () => {
  const picker = jest.requireMock('expo-image-picker');
  const saved = finding({ severity: 3, version: 0 });
  const photosPath = `/api/workshops/${WID}/findings/${saved.id}/photos`;

  beforeEach(() => {
    picker.launchImageLibraryAsync.mockResolvedValue({
      canceled: false,
      assets: [
        {
          uri: 'file:///sill.jpg',
          fileName: 'sill.jpg',
          mimeType: 'image/jpeg',
          width: 800,
          height: 600,
        },
      ],
    });
  });

  async function saveWithPhoto() {
    const utils = renderEditor(newMode);
    fireEvent.press(screen.getByTestId('severity-3'));
    fireEvent.press(screen.getByTestId('photo-add'));
    expect(await screen.findByText('sill.jpg')).toBeTruthy();
    fireEvent.press(screen.getByTestId('finding-save'));
    return utils;
  }

  it('keeps the saved finding when an upload fails, and retries only the photo', async () => {
    mockRequest
      .mockResolvedValueOnce(saved as never)
      .mockRejectedValueOnce(
        new ApiRequestError(0, 'network', 'Cannot reach the Soundframe server.'),
      )
      .mockResolvedValueOnce([] as never);
    const { onDone } = await saveWithPhoto();

    expect(await screen.findByTestId('photo-retry-0')).toBeTruthy();
    expect(screen.getByTestId('photo-status-0')).toHaveTextContent(/Not uploaded: Cannot reach/);
    expect(screen.getByTestId('finding-saved-banner')).toBeTruthy();
    expect(onDone).not.toHaveBeenCalled();
    const upload = mockRequest.mock.calls[1];
    expect(upload[0]).toBe('POST');
    expect(upload[1]).toBe(photosPath);
    expect(upload[2]?.form).toBeInstanceOf(FormData);

    fireEvent.press(screen.getByTestId('photo-retry-0'));
    await waitFor(() => expect(screen.getByTestId('photo-status-0')).toHaveTextContent('Uploaded'));
    // The finding was created once; the retry went to the same finding.
    expect(mockRequest.mock.calls.filter((c) => c[1].endsWith('/findings'))).toHaveLength(1);
    expect(mockRequest.mock.calls[2][1]).toBe(photosPath);
  });

  it('says in plain words when the server refuses a file as too large, and offers no retry', async () => {
    mockRequest
      .mockResolvedValueOnce(saved as never)
      .mockRejectedValueOnce(new ApiRequestError(413, 'too_large', 'File too large'));
    const { onDone } = await saveWithPhoto();

    await waitFor(() =>
      expect(screen.getByTestId('photo-status-0')).toHaveTextContent(
        /That file is larger than 15 MB/,
      ),
    );
    expect(screen.queryByTestId('photo-retry-0')).toBeNull();
    expect(onDone).not.toHaveBeenCalled();
    fireEvent.press(screen.getByTestId('finding-done'));
    expect(onDone).toHaveBeenCalledWith(saved);
  });
});

describe('FindingEditor, editing', () => {
  it('sends the loaded version and offers a reload when someone else saved first', async () => {
    mockRequest.mockRejectedValue(
      new ApiRequestError(409, 'stale_version', 'Changed by someone else'),
    );
    renderEditor({ kind: 'edit', finding: finding({ severity: 2, version: 3 }) });

    fireEvent.press(screen.getByTestId('severity-4'));
    fireEvent.press(screen.getByTestId('finding-save'));

    expect(await screen.findByTestId('finding-conflict')).toBeTruthy();
    const [method, path, options] = mockRequest.mock.calls[0];
    expect(method).toBe('PATCH');
    expect(path).toBe(`/api/workshops/${WID}/findings/0f1e2d3c-4b5a-4678-9abc-def012345678`);
    expect(options?.body).toMatchObject({ severity: 4, version: 3 });
  });

  it('removes the finding after confirmation and restores it from the toast’s Undo', async () => {
    const f = finding({ version: 3 });
    mockRequest.mockResolvedValueOnce(undefined as never).mockResolvedValueOnce(f as never);
    const onDeleted = jest.fn();
    render(
      <FindingEditor
        wid={WID}
        plan={fixturePlan}
        role="inspector"
        mode={{ kind: 'edit', finding: f }}
        onDone={jest.fn()}
        onDeleted={onDeleted}
      />,
      { wrapper },
    );
    fireEvent.press(screen.getByTestId('finding-delete'));
    expect(mockRequest).not.toHaveBeenCalled();
    fireEvent.press(screen.getByTestId('confirm-ok'));
    await waitFor(() => expect(onDeleted).toHaveBeenCalledWith(f));
    expect(mockRequest.mock.calls[0].slice(0, 2)).toEqual([
      'DELETE',
      `/api/workshops/${WID}/findings/${f.id}`,
    ]);

    fireEvent.press(screen.getByTestId('toast-action'));
    await waitFor(() => expect(mockRequest).toHaveBeenCalledTimes(2));
    expect(mockRequest.mock.calls[1].slice(0, 2)).toEqual([
      'POST',
      `/api/workshops/${WID}/findings/${f.id}/restore`,
    ]);
  });

  it('hides photo controls from a role that may not add photos', () => {
    renderEditor(newMode, 'client');
    expect(screen.queryByTestId('photo-add')).toBeNull();
  });
});
