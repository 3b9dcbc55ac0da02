import { fireEvent, render, screen } from '@testing-library/react-native';
import { correctedMoisture } from '@/shared/wood';
import { request } from '@/src/api/client';
import { FindingEditor } from '@/src/components/findings/finding-editor';
import { CONFIRM_NOTE } from '@/src/components/wood/agents-panel';
import { MoisturePanel } from '@/src/components/wood/moisture-panel';
import { fixturePlan } from './fixtures/fixture-plan';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('expo-image-picker', () => ({
  launchImageLibraryAsync: jest.fn(),
  launchCameraAsync: jest.fn(),
  requestCameraPermissionsAsync: jest.fn(async () => ({ granted: true })),
}));

const SHOP = { airTempC: 16.5, relativeHumidity: 62 };
const oneDecimal = (n: number) => `${(Math.round(n * 10) / 10).toFixed(1)} %`;
const textOf = (id: string) => {
  const children = screen.getByTestId(id).props.children;
  return Array.isArray(children) ? children.join('') : String(children);
};

function panel(
  meterReading: string,
  woodTempC: string,
  climate: typeof SHOP | null = SHOP,
  units: 'metric' | 'imperial' = 'metric',
  species: string | null = 'white-ash',
) {
  return render(
    <MoisturePanel
      meterReading={meterReading}
      woodTempC={woodTempC}
      species={species}
      climate={climate}
      units={units}
    />,
  );
}

describe('MoisturePanel', () => {
  it('shows the reading corrected for wood temperature and species, as the shared correction gives it', () => {
    panel('28', '12');
    const expected = correctedMoisture({ meterReading: 28, woodTempC: 12, species: 'white-ash' });
    // A cold pin meter reads low and ash reads differently from the Douglas-fir calibration.
    expect(expected.corrected).not.toBeCloseTo(28, 0);
    expect(textOf('moisture-corrected')).toBe(oneDecimal(expected.corrected));
    expect(screen.getByTestId('moisture-steps')).toHaveTextContent(
      `→ ${oneDecimal(expected.temperatureCorrected)} at 12 °C`,
      { exact: false },
    );
  });

  it('names the decay-risk level in words with its step on the scale', () => {
    panel('10', '20');
    expect(textOf('moisture-risk-level')).toBe('Dry');
    expect(screen.getByTestId('moisture-risk').props.accessibilityLabel).toMatch(
      /Decay risk: Dry, step 1 of 4/,
    );
    screen.unmount();
    panel('45', '20');
    expect(textOf('moisture-risk-level')).toBe('Saturated');
    expect(screen.getByTestId('moisture-risk').props.accessibilityLabel).toMatch(/step 4 of 4/);
  });

  it('compares with the shop’s equilibrium moisture content and asks for a water source when far above it', () => {
    panel('30', '16');
    expect(screen.getByTestId('moisture-emc')).toHaveTextContent(
      /16\.5 °C, 62 % relative humidity: wood settles near \d+\.\d %/,
    );
    expect(screen.getByTestId('moisture-hint')).toHaveTextContent(/look for a water source/);
  });

  it('gives no hint when the reading is what the shop air explains', () => {
    panel('12', '16');
    expect(screen.queryByTestId('moisture-hint')).toBeNull();
  });

  it('says when the survey recorded no shop climate, and then gives no hint', () => {
    panel('30', '16', null);
    expect(screen.getByTestId('moisture-emc')).toHaveTextContent(/No shop climate recorded/);
    expect(screen.queryByTestId('moisture-hint')).toBeNull();
    screen.unmount();
    panel('30', '16', { airTempC: 18, relativeHumidity: null } as never);
    expect(screen.getByTestId('moisture-emc')).toHaveTextContent(/No shop climate recorded/);
  });

  it('waits for a usable reading: nothing corrected while empty or half-typed', () => {
    panel('', '');
    expect(screen.getByTestId('moisture-empty')).toBeTruthy();
    expect(screen.queryByTestId('moisture-corrected')).toBeNull();
    screen.unmount();
    panel('2x', '12');
    expect(screen.queryByTestId('moisture-corrected')).toBeNull();
  });

  it('shows temperatures in °F for an imperial workshop', () => {
    panel('20', '10', SHOP, 'imperial');
    expect(screen.getByTestId('moisture-steps')).toHaveTextContent(/at 50 °F/);
    expect(screen.getByTestId('moisture-emc')).toHaveTextContent(/61\.7 °F/);
  });
});

const wrapper = TestProviders;

describe('finding form', () => {
  beforeEach(() => (request as jest.Mock).mockReset());

  function renderForm() {
    render(
      <FindingEditor
        wid="4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f"
        plan={fixturePlan}
        role="inspector"
        mode={{
          kind: 'new',
          surveyId: '7b8c9d0e-1f2a-4b3c-9d4e-5f6a7b8c9d0e',
          zoneKey: 'left-sill',
          pin: null,
        }}
        climate={SHOP}
        onDone={jest.fn()}
      />,
      { wrapper },
    );
  }

  it('updates the moisture panel as the meter reading and wood temperature are typed', () => {
    renderForm();
    expect(screen.getByTestId('moisture-empty')).toBeTruthy();
    fireEvent.changeText(screen.getByTestId('finding-meter'), '26');
    const untempered = correctedMoisture({
      meterReading: 26,
      woodTempC: null,
      species: 'white-ash',
    });
    expect(textOf('moisture-corrected')).toBe(oneDecimal(untempered.corrected));
    fireEvent.changeText(screen.getByTestId('finding-wood-temp'), '5');
    const cold = correctedMoisture({ meterReading: 26, woodTempC: 5, species: 'white-ash' });
    expect(textOf('moisture-corrected')).toBe(oneDecimal(cold.corrected));
    expect(screen.getByTestId('moisture-hint')).toBeTruthy();
    // Nothing is sent while typing: the panel is computed on the device.
    expect(request).not.toHaveBeenCalled();
  });

  it('suggests likely agents from insect evidence, always with the advice to have them confirmed', () => {
    renderForm();
    expect(screen.queryByTestId('agents-panel')).toBeNull();
    fireEvent.press(screen.getByTestId('evidence-frass-powder'));
    fireEvent.changeText(screen.getByTestId('finding-hole'), '1.2');
    expect(screen.getByTestId('agent-lyctid-beetles')).toHaveTextContent(/Closest match/);
    expect(screen.getByTestId('agents-confirm-note')).toHaveTextContent(CONFIRM_NOTE);

    // Evidence that points nowhere still carries the advice.
    fireEvent.press(screen.getByTestId('evidence-frass-powder'));
    fireEvent.changeText(screen.getByTestId('finding-hole'), '40');
    expect(screen.getByTestId('agents-confirm-note')).toHaveTextContent(CONFIRM_NOTE);
  });
});
