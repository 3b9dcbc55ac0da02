import { fireEvent, render, screen, within } from '@testing-library/react-native';
import type { RepairPlanResponse } from '@/shared/schemas/repair-plan';
import { RepairPlanView } from '@/src/components/plan/repair-plan-view';
import { TestProviders } from './support/providers';

const condition: RepairPlanResponse['condition'] = {
  grade: 'major-repair',
  gradeLabel: 'Major repair',
  gradeRank: 4,
  gradeText: 'A large part of the load-bearing frame needs work.',
  primaryMembers: 10,
  primarySound: 6,
  primarySoundShare: 0.6,
  countsByClass: { 'structural-must-fix': 2, cosmetic: 1, monitor: 0 },
  undecidedZones: 1,
  activeZones: 0,
  watchedZones: 1,
};
const item = (zoneKey: string, zoneLabel: string, hours: number, totalCost: number) => ({
  zoneKey,
  zoneLabel,
  verdictLabel: 'Replace the member',
  reasons: ['Less than half the section is sound.'],
  worstSeverity: 3,
  hours,
  totalCost,
  boardFeet: 2.5,
});

function buildPlan(over: Partial<RepairPlanResponse> = {}): RepairPlanResponse {
  return {
    condition,
    structural: [
      item('sill-left', 'Left sill', 6, 380),
      item('pillar-a', 'Left hinge pillar', 4, 220),
    ],
    cosmetic: [item('skin-door', 'Left door skin', 1.5, 85)],
    monitor: [
      {
        zoneKey: 'rail-r',
        zoneLabel: 'Right tonneau rail',
        stateLabel: 'Treated, watching',
        reason: 'Treated on 2 Nov 2026; 1 of 2 clean re-checks.',
        nextDue: '2026-12-14',
        overdue: false,
      },
    ],
    undecided: [{ zoneKey: 'floor-1', zoneLabel: 'Front floor board', worstSeverity: 2 }],
    totals: {
      hours: 11.5,
      totalCost: 685,
      currency: 'GBP',
      structural: { count: 2, hours: 10, totalCost: 600 },
      cosmetic: { count: 1, hours: 1.5, totalCost: 85 },
      boardFeetBySpecies: [{ label: 'White ash', boardFeet: 7.5, cost: 90 }],
    },
    cutList: [
      {
        zoneLabel: 'Left sill',
        speciesLabel: 'White ash',
        finishedThicknessMm: 45,
        finishedWidthMm: 90,
        finishedLengthMm: 1200,
        roughQuarters: 8,
        boardFeetWithWaste: 2.5,
        cost: 30,
      },
    ],
    workOrder: [
      {
        key: 'primary-frame',
        title: 'Main frame',
        why: 'It carries everything else.',
        zoneLabels: ['Left sill'],
      },
    ],
    units: 'metric',
    ...over,
  };
}

describe('repair plan view', () => {
  it('lists structural and cosmetic work apart with their totals, the timber and the order of work', () => {
    const open = jest.fn();
    render(<RepairPlanView plan={buildPlan()} wide={false} onOpenZone={open} />, {
      wrapper: TestProviders,
    });
    expect(screen.getByTestId('plan-grade')).toHaveTextContent(/Major repair \(grade 4 of 5\)/);
    expect(screen.getByTestId('plan-grade')).toHaveTextContent(
      /60\s?% of the primary members sound \(6 of 10\)/,
    );
    const structural = within(screen.getByTestId('plan-structural'));
    expect(structural.getByTestId('plan-structural-total')).toHaveTextContent(
      /^2 members · 10 h · £600\.00$/,
    );
    expect(structural.getByTestId('plan-item-sill-left')).toBeTruthy();
    expect(structural.queryByTestId('plan-item-skin-door')).toBeNull();
    const cosmetic = within(screen.getByTestId('plan-cosmetic'));
    expect(cosmetic.getByTestId('plan-cosmetic-total')).toHaveTextContent(
      /^1 member · 1.5 h · £85\.00$/,
    );
    expect(cosmetic.queryByTestId('plan-item-sill-left')).toBeNull();
    expect(screen.getByTestId('plan-undecided')).toHaveTextContent(/Front floor board/);
    expect(screen.getByTestId('plan-monitor')).toHaveTextContent(/Next re-check 14 Dec 2026/);
    expect(screen.getByTestId('plan-cut-row-0')).toHaveTextContent(
      /45 mm × 90 mm × 1200 mm · 8\/4 rough · 2\.50 bd ft/,
    );
    expect(screen.getByTestId('plan-step-primary-frame')).toHaveTextContent(/1\. Main frame/);
    fireEvent.press(screen.getByTestId('plan-item-pillar-a'));
    expect(open).toHaveBeenCalledWith('pillar-a');
    fireEvent.press(screen.getByTestId('plan-undecided-floor-1'));
    expect(open).toHaveBeenLastCalledWith('floor-1');
  });

  it('says there is nothing to plan when no decision and no waiting damage exist', () => {
    render(
      <RepairPlanView
        plan={buildPlan({
          structural: [],
          cosmetic: [],
          monitor: [],
          undecided: [],
          cutList: [],
          workOrder: [],
        })}
        wide
        onOpenZone={() => {}}
      />,
      { wrapper: TestProviders },
    );
    expect(screen.getByTestId('plan-empty')).toHaveTextContent(/Nothing to plan yet/);
    expect(screen.getByText('No structural work decided.')).toBeTruthy();
    expect(screen.getByText('No new timber in the decisions so far.')).toBeTruthy();
    expect(screen.queryByTestId('plan-undecided')).toBeNull();
  });
});
