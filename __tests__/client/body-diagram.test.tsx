import { fireEvent, render, screen, within } from '@testing-library/react-native';
import type { ReactTestInstance } from 'react-test-renderer';
import { BODY_PLANS, bodyPlanSchema, type BodyPlan } from '@/shared/body-plans';
import { BodyDiagram, DiagramLegend, ViewSwitcher } from '@/src/components/body-diagram';
import { SEVERITY_LABELS } from '@/shared/schemas';
import { fixturePlan } from './fixtures/fixture-plan';

function renderView(
  plan: BodyPlan,
  view: BodyPlan['views'][number]['key'],
  extra: Partial<Parameters<typeof BodyDiagram>[0]> = {},
) {
  const onZonePress = jest.fn();
  const utils = render(
    <BodyDiagram
      plan={plan}
      view={view}
      zoneSummaries={{}}
      pins={[]}
      onZonePress={onZonePress}
      {...extra}
    />,
  );
  return { ...utils, onZonePress };
}

/** The text an SVG element draws (react-native-svg renders it as TSpan `content`, not <Text>). */
function svgText(el: ReactTestInstance): string {
  return el
    .findAll((n) => (n.type as unknown) === 'RNSVGTSpan')
    .map((n) => n.props.content ?? '')
    .join('');
}

describe('fixture plan', () => {
  it('is a valid body plan, so the diagram tests exercise real-shaped data', () => {
    expect(bodyPlanSchema.safeParse(fixturePlan).success).toBe(true);
  });
});

describe('BodyDiagram renders every plan', () => {
  it('has body plans to render (the shared registry is not empty)', () => {
    expect(BODY_PLANS.length).toBeGreaterThanOrEqual(4);
  });

  const plans = [fixturePlan, ...BODY_PLANS];
  for (const plan of plans) {
    for (const view of plan.views) {
      it(`${plan.key} / ${view.key}: every zone drawn in the view is a pressable element`, () => {
        const { onZonePress, unmount } = renderView(plan, view.key);
        const keys = [...new Set(view.shapes.map((s) => s.zone))];
        for (const key of keys) expect(screen.getByTestId('zone-' + key)).toBeTruthy();
        // Only this view's zones are drawn.
        expect(screen.queryAllByTestId(/^zone-/)).toHaveLength(keys.length);
        const last = keys[keys.length - 1];
        fireEvent.press(screen.getByTestId('zone-' + last));
        expect(onZonePress).toHaveBeenCalledTimes(1);
        expect(onZonePress.mock.calls[0][0]).toBe(last);
        unmount();
      });
    }
  }
});

describe('BodyDiagram severity cues', () => {
  it('shows the worst severity as a number and in the accessible label, and nothing for unlogged zones', () => {
    renderView(fixturePlan, 'left', {
      zoneSummaries: {
        'left-sill': { worstSeverity: 3, count: 2 },
        'left-hinge-pillar': { worstSeverity: 0, count: 1 },
      },
    });
    const sill = screen.getByTestId('zone-left-sill');
    expect(svgText(sill)).toBe('3');
    expect(sill.props.accessibilityLabel).toBe('Left sill, severity 3, 2 findings');
    expect(svgText(screen.getByTestId('zone-left-hinge-pillar'))).toBe('0');
    const unlogged = screen.getByTestId('zone-left-roof-rail');
    expect(svgText(unlogged)).toBe('');
    expect(unlogged.props.accessibilityLabel).toBe('Left roof rail, nothing logged');
  });

  it('hatches severities 3 and 4 (a cue that needs no colour) but not 0–2', () => {
    renderView(fixturePlan, 'left', {
      zoneSummaries: {
        'left-sill': { worstSeverity: 3, count: 1 },
        'left-roof-rail': { worstSeverity: 4, count: 1 },
        'left-waist-rail': { worstSeverity: 2, count: 1 },
      },
    });
    const hatchRefs = (key: string) =>
      screen
        .getByTestId('zone-' + key)
        .findAll((n) => (n.type as unknown) === 'RNSVGPath')
        .map((n) => n.props.fill?.brushRef)
        .filter(Boolean);
    expect(hatchRefs('left-sill')).toEqual([expect.stringMatching(/-hatch-3$/)]);
    expect(hatchRefs('left-roof-rail')).toEqual([expect.stringMatching(/-hatch-4$/)]);
    expect(hatchRefs('left-waist-rail')).toEqual([]);
  });

  it('reports where a zone was touched, in view units', () => {
    // Unmeasured, the drawing is 358 px wide for a 1000-unit view.
    const { onZonePress } = renderView(fixturePlan, 'left');
    fireEvent.press(screen.getByTestId('zone-left-sill'), {
      nativeEvent: { locationX: 179, locationY: 107.4 },
    });
    expect(onZonePress).toHaveBeenCalledWith('left-sill', { x: 500, y: 300 });
  });

  it('draws a pin per finding with its severity, above the zones and letting presses through', () => {
    renderView(fixturePlan, 'left', {
      pins: [
        { id: 'p1', zoneKey: 'left-lock-pillar', x: 570, y: 200, severity: 4 },
        { id: 'p2', zoneKey: 'left-sill', x: 400, y: 315, severity: 1 },
      ],
    });
    const pin = screen.getByTestId('pin-p1');
    expect(svgText(pin)).toBe('4');
    expect(svgText(screen.getByTestId('pin-p2'))).toBe('1');
    expect(pin.props.pointerEvents).toBe('none');
  });
});

describe('BodyDiagram size', () => {
  it('keeps the view’s proportions at a given width (an enlarged drawing)', () => {
    renderView(fixturePlan, 'top', { width: 840, testID: 'diagram' });
    const svg = screen
      .getByTestId('diagram')
      .findAll((n) => (n.type as unknown) === 'RNSVGSvgView')[0];
    // The top view is 1000 × 420 units.
    expect(svg.props.bbWidth).toBe(840);
    expect(svg.props.bbHeight).toBeCloseTo(352.8);
  });
});

describe('DiagramLegend', () => {
  it('lists severities 0–4 with their titles and the unlogged state', () => {
    render(<DiagramLegend />);
    for (const s of [0, 1, 2, 3, 4]) {
      const item = screen.getByTestId('legend-' + s);
      expect(within(item).getByText(`${s} ${SEVERITY_LABELS[s].title}`)).toBeTruthy();
    }
    expect(screen.getByText('Nothing logged')).toBeTruthy();
  });
});

describe('ViewSwitcher', () => {
  it('offers the plan’s views and reports the chosen one', () => {
    const onChange = jest.fn();
    render(<ViewSwitcher plan={fixturePlan} value="left" onChange={onChange} />);
    expect(screen.queryByTestId('view-front')).toBeNull();
    fireEvent.press(screen.getByTestId('view-underside'));
    expect(onChange).toHaveBeenCalledWith('underside');
  });
});
