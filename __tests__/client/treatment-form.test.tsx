import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import type { ReactTestInstance } from 'react-test-renderer';
import type { TreatmentResponse } from '@/shared/schemas/treatment';
import { ApiRequestError, request } from '@/src/api/client';
import { TreatmentEditor } from '@/src/components/treatments/treatment-editor';
import { fixturePlan } from './fixtures/fixture-plan';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const WID = '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f';
const VID = '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

const wrapper = TestProviders;

function renderEditor() {
  const onDone = jest.fn();
  render(
    <TreatmentEditor
      wid={WID}
      plan={fixturePlan}
      mode={{ kind: 'new', vehicleId: VID, applicatorName: 'Priya Halloran', zoneKeys: [] }}
      regulatoryNotes="County rule 12: notify the fire station before any fumigation."
      region="Testshire"
      onDone={onDone}
    />,
    { wrapper },
  );
  return { onDone };
}

function fillLabelAndWork() {
  fireEvent.changeText(screen.getByTestId('treatment-product'), 'Test Borate 10');
  fireEvent.changeText(screen.getByTestId('treatment-registration'), 'REG-1');
  fireEvent.changeText(screen.getByTestId('treatment-ingredient'), 'Disodium octaborate');
  fireEvent.changeText(screen.getByTestId('treatment-concentration'), '40 %');
  fireEvent.press(screen.getByTestId('treatment-method-brush'));
  fireEvent.press(screen.getByTestId('treatment-target-anobiid-beetles'));
  fireEvent.changeText(screen.getByTestId('treatment-amount'), '1,5');
  fireEvent.changeText(screen.getByTestId('treatment-unit'), 'L');
  fireEvent.changeText(screen.getByTestId('treatment-reentry'), '4');
  fireEvent.changeText(screen.getByTestId('treatment-air-temp'), '14');
  fireEvent.press(screen.getByTestId('treatment-ppe-0'));
}

/** The words react-native-svg draws inside an element (its text spans). */
function svgText(el: ReactTestInstance): string {
  return el
    .findAll((n) => (n.type as unknown) === 'RNSVGTSpan')
    .map((n) => n.props.content ?? '')
    .join('');
}

beforeEach(() => mockRequest.mockReset());

describe('treatment form', () => {
  it('picks zones by tapping them on the drawing, and drops one tapped again', () => {
    renderEditor();
    expect(screen.getByTestId('treatment-zone-count')).toHaveTextContent('No zones chosen yet');
    fireEvent.press(screen.getByTestId('zone-left-sill'));
    fireEvent.press(screen.getByTestId('zone-left-lock-pillar'));
    expect(screen.getByTestId('treatment-zone-count')).toHaveTextContent('2 zones chosen');
    fireEvent.press(screen.getByTestId('zone-left-sill'));
    expect(screen.getByTestId('treatment-zone-count')).toHaveTextContent('1 zone chosen');
  });

  it('shows the cautions with the workshop’s local notes, and the fumigation warning only for fumigation', () => {
    renderEditor();
    expect(screen.getByTestId('caution-label-is-law')).toHaveTextContent(/label/i);
    expect(screen.getByTestId('treatment-regulatory-notes')).toHaveTextContent(
      /Testshire.*County rule 12/,
    );
    expect(screen.queryByTestId('fumigation-caution')).toBeNull();
    fireEvent.press(screen.getByTestId('treatment-method-fumigation'));
    expect(screen.getByTestId('fumigation-caution')).toHaveTextContent(/licensed fumigator/);
    fireEvent.press(screen.getByTestId('treatment-method-heat'));
    expect(screen.queryByTestId('fumigation-caution')).toBeNull();
  });

  it('refuses to save without the label confirmation, naming the missing fields, and sends nothing', async () => {
    renderEditor();
    fireEvent.press(screen.getByTestId('treatment-save'));
    await screen.findByTestId('treatment-label-confirm-error');
    expect(screen.getByTestId('treatment-label-confirm-error')).toHaveTextContent(
      'Confirm you read and followed the label',
    );
    expect(screen.getByTestId('treatment-zones-error')).toHaveTextContent('Pick at least one zone');
    expect(screen.getByTestId('treatment-product-error')).toHaveTextContent(/product name/);
    expect(screen.getByTestId('treatment-reentry-error')).toHaveTextContent(/re-entry time/);
    expect(mockRequest).not.toHaveBeenCalled();
  });

  it('sends the label fields as typed, the zones picked and the numbers read, once confirmed', async () => {
    const { onDone } = renderEditor();
    fireEvent.press(screen.getByTestId('zone-left-sill'));
    fireEvent.press(screen.getByTestId('zone-left-lock-pillar'));
    fillLabelAndWork();
    fireEvent.press(screen.getByTestId('treatment-label-confirm'));
    const saved = { id: 'x' } as unknown as TreatmentResponse;
    mockRequest.mockResolvedValueOnce(saved);
    fireEvent.press(screen.getByTestId('treatment-save'));
    await waitFor(() => expect(onDone).toHaveBeenCalledWith(saved));
    const [method, path, options] = mockRequest.mock.calls[0];
    expect(method).toBe('POST');
    expect(path).toBe(`/api/workshops/${WID}/vehicles/${VID}/treatments`);
    const body = options!.body as Record<string, unknown>;
    expect(body).toMatchObject({
      applicatorName: 'Priya Halloran',
      productName: 'Test Borate 10',
      registrationNumber: 'REG-1',
      activeIngredient: 'Disodium octaborate',
      concentration: '40 %',
      method: 'brush',
      targetAgent: 'anobiid-beetles',
      zoneKeys: ['left-sill', 'left-lock-pillar'],
      quantity: { amount: 1.5, unit: 'L' },
      reentryHours: 4,
      ppe: ['Chemical-resistant gloves'],
      conditions: { airTempC: 14, woodMoisturePercent: null },
      labelConfirmed: true,
    });
    expect(body.id).toMatch(UUID);
    expect(Number.isNaN(Date.parse(body.appliedAt as string))).toBe(false);
  });

  it('puts the server’s field errors beside their fields', async () => {
    renderEditor();
    fireEvent.press(screen.getByTestId('zone-left-sill'));
    fillLabelAndWork();
    fireEvent.press(screen.getByTestId('treatment-label-confirm'));
    mockRequest.mockRejectedValueOnce(
      new ApiRequestError(400, 'validation_failed', 'Some fields are not valid', {
        zoneKeys: 'Zone left-sill is not on this vehicle’s body plan',
        'quantity.amount': 'The amount must not be negative',
      }),
    );
    fireEvent.press(screen.getByTestId('treatment-save'));
    expect(await screen.findByTestId('treatment-zones-error')).toHaveTextContent(
      /not on this vehicle/,
    );
    expect(screen.getByTestId('treatment-quantity-error')).toHaveTextContent(
      /must not be negative/,
    );
    expect(screen.queryByTestId('treatment-message')).toBeNull();
  });
});

describe('zone state on the drawing', () => {
  it('writes each state as a word under the zone and in its spoken label, never colour alone', () => {
    render(
      <TreatmentEditor
        wid={WID}
        plan={fixturePlan}
        mode={{ kind: 'new', vehicleId: VID, applicatorName: 'P', zoneKeys: [] }}
        regulatoryNotes=""
        zoneStates={{
          'left-sill': { state: 'treated-watching', flagged: false },
          'left-lock-pillar': { state: 'active', flagged: true },
          'left-wheel-arch': { state: 'no-evidence', flagged: false },
        }}
        onDone={jest.fn()}
      />,
      { wrapper },
    );
    expect(svgText(screen.getByTestId('zone-state-left-sill'))).toBe('WATCH');
    expect(svgText(screen.getByTestId('zone-state-left-lock-pillar'))).toBe('! ACTIVE');
    expect(screen.queryByTestId('zone-state-left-wheel-arch')).toBeNull();
    expect(screen.getByTestId('zone-left-lock-pillar').props.accessibilityLabel).toMatch(
      /Active, Possible treatment failure — call a licensed operator/,
    );
    expect(screen.getByTestId('treatment-regulatory-notes')).toHaveTextContent(
      /has not added notes on local rules/,
    );
  });
});
