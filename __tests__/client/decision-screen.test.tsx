import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { getZone } from '@/shared/body-plans';
import type {
  DecisionResponse,
  FindingResponse,
  SaveDecisionRequest,
  WorkshopSettings,
} from '@/shared/schemas';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood';
import { ApiRequestError, request } from '@/src/api/client';
import { DecisionEditor } from '@/src/components/decisions/decision-editor';
import { fixturePlan } from './fixtures/fixture-plan';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const WID = '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f';
const VID = '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f';
const PUT_PATH = `/api/workshops/${WID}/vehicles/${VID}/decisions/left-sill`;
// The fixture's left sill: white ash, 45 mm wide × 70 mm deep, 900 mm long, primary structure.
const zone = getZone(fixturePlan, 'left-sill')!;

const settings = (over: Partial<WorkshopSettings> = {}): WorkshopSettings => ({
  units: 'metric',
  paperSize: 'A4',
  region: '',
  labourRatePerHour: 40,
  currency: 'EUR',
  wood: DEFAULT_WOOD_SETTINGS,
  treatments: DEFAULT_TREATMENT_SETTINGS,
  ...over,
});

function finding(over: Partial<FindingResponse> = {}): FindingResponse {
  return {
    id: '0f1e2d3c-4b5a-4678-9abc-def012345678',
    surveyId: '7b8c9d0e-1f2a-4b3c-9d4e-5f6a7b8c9d0e',
    vehicleId: VID,
    surveyDate: '2025-03-14',
    zoneKey: 'left-sill',
    severity: 2,
    decayType: 'brown-rot',
    insectEvidence: [],
    holeDiameterMm: null,
    activity: 'inactive',
    moisture: null,
    pickTest: 'brash-break',
    decayDepthMm: { top: 5, bottom: 0, left: 0, right: 0 },
    affectedLengthMm: 200,
    atJointOrFitting: false,
    pin: null,
    notes: '',
    photos: [],
    authorName: 'Ines Varga',
    version: 0,
    createdAt: '2025-03-14T10:00:00.000Z',
    updatedAt: '2025-03-14T10:00:00.000Z',
    deletedAt: null,
    ...over,
  };
}

/** What the server answers for a saved body (its own recommendation fields are not under test here). */
function saved(body: SaveDecisionRequest, over: Partial<DecisionResponse> = {}): DecisionResponse {
  return {
    id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
    vehicleId: VID,
    zoneKey: 'left-sill',
    inputs: body.inputs as DecisionResponse['inputs'],
    recommendedOption: 'splice',
    recommendationReasons: ['From the server'],
    chosenOption: body.chosenOption,
    overrideReason: body.overrideReason ?? '',
    decisionClass: 'structural-must-fix',
    estimatedHours: 8,
    labourCost: 320,
    materialCost: 30,
    totalCost: 350,
    materials: [],
    splice: null,
    notes: body.notes ?? '',
    decidedById: null,
    decidedByName: 'Ines Varga',
    version: 0,
    createdAt: '2025-03-15T10:00:00.000Z',
    updatedAt: '2025-03-15T10:00:00.000Z',
    ...over,
  };
}

const wrapper = TestProviders;

function renderEditor(
  opts: {
    findings?: FindingResponse[];
    decisions?: DecisionResponse[];
    settings?: WorkshopSettings;
  } = {},
) {
  render(
    <DecisionEditor
      wid={WID}
      vehicleId={VID}
      plan={fixturePlan}
      zone={zone}
      findings={opts.findings ?? [finding()]}
      decisions={opts.decisions ?? []}
      settings={opts.settings ?? settings()}
    />,
    { wrapper },
  );
}

const value = (id: string) => screen.getByTestId(id).props.value;
const type = (id: string, text: string) => fireEvent.changeText(screen.getByTestId(id), text);
const sentBodies = () =>
  mockRequest.mock.calls
    .filter(([m]) => m === 'PUT')
    .map(([, , o]) => o?.body as SaveDecisionRequest);

beforeEach(() => mockRequest.mockReset());

describe('member decision screen', () => {
  it('starts from the zone’s nominal section and its worst open finding', () => {
    renderEditor({
      findings: [
        finding({ severity: 1, decayDepthMm: { top: 2, bottom: 0, left: 0, right: 0 } }),
        finding({
          id: '1f1e2d3c-4b5a-4678-9abc-def012345678',
          severity: 3,
          decayDepthMm: { top: 0, bottom: 12, left: 4, right: 0 },
          affectedLengthMm: 260,
          atJointOrFitting: true,
        }),
      ],
    });
    expect(value('decision-width')).toBe('45');
    expect(value('decision-depth')).toBe('70');
    expect(value('decision-member-length')).toBe('900');
    // The severity-3 finding is the worst: its depths, length and joint flag.
    expect(value('decision-decay-top')).toBe('');
    expect(value('decision-decay-bottom')).toBe('12');
    expect(value('decision-decay-left')).toBe('4');
    expect(value('decision-affected-length')).toBe('260');
    expect(screen.getByTestId('decision-joint').props.accessibilityState).toMatchObject({
      checked: true,
    });
  });

  it('recommends live as decay depths are entered, with reasons, the splice geometry and the cut-list line', () => {
    renderEditor();
    // 5 mm off the top of 70: (65/70)² = 86 % of the section modulus, between consolidate (75) and keep (90).
    expect(screen.getByTestId('recommendation-option')).toHaveTextContent('Consolidate');
    expect(screen.getByTestId('ratio-modulus')).toHaveTextContent('86 %');
    expect(screen.queryByTestId('cut-list')).toBeNull();

    type('decision-decay-bottom', '20');
    // Depth 45 of 70: (45/70)² = 41 %, below consolidate. 200 of 900 mm is within the 35 % splice
    // limit, but two 700 mm scarfs (1:10 through 70 mm) do not fit a 900 mm member: replace it.
    expect(screen.getByTestId('ratio-modulus')).toHaveTextContent('41 %');
    expect(screen.getByTestId('recommendation-option')).toHaveTextContent('Replace the member');
    // On a 2400 mm member the splice fits (200 + 2 × 700 = 1600 mm of new wood).
    type('decision-member-length', '2400');
    expect(screen.getByTestId('recommendation-option')).toHaveTextContent('Splice in new wood');
    expect(screen.getByTestId('recommendation-reasons')).toHaveTextContent(
      /41 % of the section modulus/,
    );
    expect(screen.getByTestId('recommendation-class')).toHaveTextContent('Structural, must fix');
    // A scarf through 70 mm at the default 1:10, splices three scarf lengths apart.
    expect(screen.getByTestId('splice-length')).toHaveTextContent(/Scarf length 700 mm at a 1:10/);
    expect(screen.getByTestId('splice-spacing')).toHaveTextContent(/at least 2100 mm apart/);
    expect(screen.getByTestId('cut-list-line-0')).toHaveTextContent(/White ash, \d+\/4 rough/);
    expect(screen.getByTestId('estimate-labour')).toHaveTextContent(/160/);
    expect(mockRequest).not.toHaveBeenCalled();
  });

  it('asks for a reason when another option is chosen, then saves the override with the measurements in mm', async () => {
    mockRequest.mockImplementation(
      async (_m, _p, o) => saved(o?.body as SaveDecisionRequest) as never,
    );
    renderEditor();
    type('decision-decay-bottom', '20');
    type('decision-member-length', '2400');
    fireEvent.press(screen.getByTestId('decision-option-replace-member'));
    expect(screen.getByTestId('decision-choice-status')).toHaveTextContent(
      'Chosen: replace the member, instead of the recommended splice in new wood.',
    );
    fireEvent.press(screen.getByTestId('decision-save'));
    expect(await screen.findByTestId('decision-override-reason-error')).toHaveTextContent(
      /Say why/,
    );
    expect(mockRequest).not.toHaveBeenCalled();

    type('decision-override-reason', 'Owner prefers a new sill');
    fireEvent.press(screen.getByTestId('decision-save'));
    await screen.findByTestId('decision-saved-at');
    const [method, path] = mockRequest.mock.calls[0];
    expect([method, path]).toEqual(['PUT', PUT_PATH]);
    expect(sentBodies()[0]).toEqual({
      version: undefined,
      inputs: {
        widthMm: 45,
        depthMm: 70,
        decayMm: { top: 5, bottom: 20, left: 0, right: 0 },
        affectedLengthMm: 200,
        memberLengthMm: 2400,
        atJointOrFitting: false,
        species: 'white-ash',
      },
      chosenOption: 'replace-member',
      overrideReason: 'Owner prefers a new sill',
      notes: '',
    });
    expect(screen.getByTestId('decision-saved-at')).toHaveTextContent(/Saved by Ines Varga/);
  });

  it('follows the recommendation without a reason, and sends the saved version on the next save', async () => {
    mockRequest.mockImplementation(
      async (_m, _p, o) => saved(o?.body as SaveDecisionRequest, { version: 4 }) as never,
    );
    renderEditor();
    fireEvent.press(screen.getByTestId('decision-save'));
    await screen.findByTestId('decision-saved-at');
    expect(sentBodies()[0]).toMatchObject({ chosenOption: 'consolidate', overrideReason: '' });

    type('decision-notes', 'Harden from below');
    fireEvent.press(screen.getByTestId('decision-save'));
    await waitFor(() => expect(sentBodies()).toHaveLength(2));
    expect(sentBodies()[1]).toMatchObject({ version: 4, notes: 'Harden from below' });
  });

  it('shows the server’s field errors beside their fields', async () => {
    mockRequest.mockRejectedValue(
      new ApiRequestError(400, 'validation_failed', 'Check the fields', {
        overrideReason: 'Say why you chose differently',
        'inputs.decayMm.top': 'Deeper than the member (70 mm)',
      }),
    );
    renderEditor();
    fireEvent.press(screen.getByTestId('decision-option-keep'));
    type('decision-override-reason', 'x');
    fireEvent.press(screen.getByTestId('decision-save'));
    expect(await screen.findByTestId('decision-override-reason-error')).toHaveTextContent(
      'Say why you chose differently',
    );
    expect(screen.getByTestId('decision-decay-top-error')).toHaveTextContent(
      'Deeper than the member (70 mm)',
    );
    // Editing the field clears its message.
    type('decision-decay-top', '6');
    expect(screen.queryByTestId('decision-decay-top-error')).toBeNull();
  });

  it('on a stale save (409) offers a reload, which starts again from the saved decision', async () => {
    const theirs = saved(
      {
        inputs: {
          widthMm: 45,
          depthMm: 70,
          decayMm: { top: 12, bottom: 0, left: 0, right: 0 },
          affectedLengthMm: 150,
          memberLengthMm: 900,
          atJointOrFitting: false,
          species: 'white-oak',
        },
        chosenOption: 'splice',
        overrideReason: '',
        notes: 'Theirs',
      },
      { version: 2 },
    );
    mockRequest.mockImplementation(async (method) => {
      if (method === 'PUT')
        throw new ApiRequestError(409, 'stale_version', 'The decision was changed');
      return { items: [theirs] } as never;
    });
    renderEditor();
    fireEvent.press(screen.getByTestId('decision-save'));
    await screen.findByTestId('decision-conflict');

    fireEvent.press(screen.getByTestId('decision-reload'));
    await waitFor(() => expect(value('decision-notes')).toBe('Theirs'));
    expect(value('decision-decay-top')).toBe('12');
    expect(screen.queryByTestId('decision-conflict')).toBeNull();
    expect(mockRequest).toHaveBeenCalledWith(
      'GET',
      `/api/workshops/${WID}/vehicles/${VID}/decisions`,
      expect.anything(),
    );
  });

  it('works in inches for an imperial workshop and sends millimetres', async () => {
    mockRequest.mockImplementation(
      async (_m, _p, o) => saved(o?.body as SaveDecisionRequest) as never,
    );
    renderEditor({ findings: [], settings: settings({ units: 'imperial' }) });
    // 45 mm = 1.77 in, 70 mm = 2.76 in.
    expect(value('decision-width')).toBe('1.77');
    expect(value('decision-depth')).toBe('2.76');
    type('decision-width', '2');
    type('decision-depth', '3');
    type('decision-member-length', '36');
    type('decision-decay-top', '0.5');
    fireEvent.press(screen.getByTestId('decision-save'));
    await screen.findByTestId('decision-saved-at');
    // 1 in = 25.4 mm exactly.
    expect(sentBodies()[0].inputs).toMatchObject({
      widthMm: expect.closeTo(50.8, 9),
      depthMm: expect.closeTo(76.2, 9),
      memberLengthMm: expect.closeTo(914.4, 9),
      decayMm: { top: expect.closeTo(12.7, 9), bottom: 0, left: 0, right: 0 },
    });
  });
});
