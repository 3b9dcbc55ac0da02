import { StyleSheet, View } from 'react-native';
import type { RepairPlanItem, RepairPlanResponse } from '@/shared/schemas/repair-plan';
import { formatLength } from '@/shared/wood/units';
import { percent } from '@/shared/wood/verdict';
import { AppText, Card, Section, SeverityBadge } from '@/src/components/ui';
import { hours, money } from '@/src/components/wood/labels';
import { formatDay } from '@/src/format/dates';
import { colors, radius, spacing } from '@/src/theme';

/** The repair plan of one vehicle: the scope's lists, totals, timber to buy and order of work. */
export function RepairPlanView({
  plan,
  wide,
  onOpenZone,
}: {
  plan: RepairPlanResponse;
  wide: boolean;
  onOpenZone(zoneKey: string): void;
}) {
  const { totals, condition: c } = plan;
  const cur = totals.currency;
  const nothing =
    !plan.structural.length &&
    !plan.cosmetic.length &&
    !plan.monitor.length &&
    !plan.undecided.length;
  return (
    <View style={styles.page}>
      <View style={styles.grade} testID="plan-grade">
        <AppText variant="label">
          {c.gradeLabel} (grade {c.gradeRank} of 5)
        </AppText>
        <AppText variant="caption">{c.gradeText}</AppText>
        <AppText variant="caption" muted>
          {c.primaryMembers
            ? `${percent(c.primarySoundShare)} of the primary members sound (${c.primarySound} of ${c.primaryMembers}).`
            : 'No primary members recorded yet.'}
        </AppText>
      </View>

      {nothing ? (
        <AppText muted testID="plan-empty">
          Nothing to plan yet: no member decisions, and no damage waiting for one. Decide a member
          from its zone on the vehicle’s drawing.
        </AppText>
      ) : null}

      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={styles.column}>
          {plan.undecided.length ? (
            <Section title="Awaiting a decision" testID="plan-undecided">
              <AppText variant="caption" muted>
                Damage of severity 2 or more with no decision yet. It is not in the totals.
              </AppText>
              {plan.undecided.map((u) => (
                <Card
                  key={u.zoneKey}
                  onPress={() => onOpenZone(u.zoneKey)}
                  accessibilityLabel={`${u.zoneLabel}: decide`}
                  testID={`plan-undecided-${u.zoneKey}`}
                >
                  <View style={styles.row}>
                    <SeverityBadge severity={u.worstSeverity} />
                    <AppText variant="label">{u.zoneLabel}</AppText>
                  </View>
                </Card>
              ))}
            </Section>
          ) : null}
          <Group
            title="Structural, must fix"
            testID="plan-structural"
            items={plan.structural}
            total={totals.structural}
            currency={cur}
            onOpenZone={onOpenZone}
            empty="No structural work decided."
          />
          <Group
            title="Cosmetic"
            testID="plan-cosmetic"
            items={plan.cosmetic}
            total={totals.cosmetic}
            currency={cur}
            onOpenZone={onOpenZone}
            empty="No cosmetic work decided."
          />
          {plan.monitor.length ? (
            <Section title="Monitor" testID="plan-monitor">
              {plan.monitor.map((m) => (
                <Card key={m.zoneKey} testID={`plan-monitor-${m.zoneKey}`}>
                  <AppText variant="label">
                    {m.zoneLabel} · {m.stateLabel}
                  </AppText>
                  <AppText variant="caption">{m.reason}</AppText>
                  {m.nextDue ? (
                    <AppText variant="caption" style={m.overdue ? styles.overdue : undefined}>
                      Next re-check {formatDay(m.nextDue)}
                      {m.overdue ? ' (overdue)' : ''}
                    </AppText>
                  ) : null}
                </Card>
              ))}
            </Section>
          ) : null}
        </View>

        <View style={styles.column}>
          <Section title="Totals" testID="plan-totals">
            <Card>
              <Line
                label="Work decided"
                value={`${hours(totals.hours)} · ${money(totals.totalCost, cur)}`}
                testID="plan-total"
              />
              {totals.boardFeetBySpecies.map((b) => (
                <Line
                  key={b.label}
                  label={b.label}
                  value={`${b.boardFeet.toFixed(2)} bd ft · ${money(b.cost, cur)}`}
                />
              ))}
            </Card>
          </Section>
          <Section title="Timber to buy" testID="plan-cut-list">
            {plan.cutList.length ? (
              <>
                <AppText variant="caption" muted>
                  Finished thickness × width × length; rough stock in quarters of an inch (4/4 = 1
                  in), board feet with the workshop’s waste allowance.
                </AppText>
                {plan.cutList.map((r, i) => (
                  <Card key={`${r.zoneLabel}-${i}`} testID={`plan-cut-row-${i}`}>
                    <AppText variant="label">
                      {r.zoneLabel} · {r.speciesLabel}
                    </AppText>
                    <AppText variant="caption">
                      {[r.finishedThicknessMm, r.finishedWidthMm, r.finishedLengthMm]
                        .map((mm) => formatLength(mm, plan.units))
                        .join(' × ')}{' '}
                      · {r.roughQuarters}/4 rough · {r.boardFeetWithWaste.toFixed(2)} bd ft ·{' '}
                      {money(r.cost, cur)}
                    </AppText>
                  </Card>
                ))}
              </>
            ) : (
              <AppText muted>No new timber in the decisions so far.</AppText>
            )}
          </Section>
          {plan.workOrder.length ? (
            <Section title="Order of work" testID="plan-work-order">
              {plan.workOrder.map((s, i) => (
                <View key={s.key} style={styles.step} testID={`plan-step-${s.key}`}>
                  <AppText variant="label">
                    {i + 1}. {s.title}
                  </AppText>
                  <AppText variant="caption">{s.why}</AppText>
                  {s.zoneLabels.length ? (
                    <AppText variant="caption" muted>
                      {s.zoneLabels.join(', ')}
                    </AppText>
                  ) : null}
                </View>
              ))}
            </Section>
          ) : null}
        </View>
      </View>
      <AppText variant="caption" muted>
        Estimates from the member decisions and the workshop’s rates. Structural members carry the
        body: have repairs to them done and checked by someone competent in coachwork, and follow
        local codes for the vehicle’s use on the road.
      </AppText>
    </View>
  );
}

function Group({
  title,
  items,
  total,
  currency,
  empty,
  testID,
  onOpenZone,
}: {
  title: string;
  items: RepairPlanItem[];
  total: { count: number; hours: number; totalCost: number };
  currency: string;
  empty: string;
  testID: string;
  onOpenZone(zoneKey: string): void;
}) {
  return (
    <Section title={title} testID={testID}>
      {items.length ? (
        <AppText variant="caption" muted testID={`${testID}-total`}>
          {total.count} {total.count === 1 ? 'member' : 'members'} · {hours(total.hours)} ·{' '}
          {money(total.totalCost, currency)}
        </AppText>
      ) : (
        <AppText muted>{empty}</AppText>
      )}
      {items.map((i) => (
        <Card
          key={i.zoneKey}
          onPress={() => onOpenZone(i.zoneKey)}
          accessibilityLabel={`${i.zoneLabel}: ${i.verdictLabel}`}
          testID={`plan-item-${i.zoneKey}`}
        >
          <View style={styles.row}>
            <SeverityBadge severity={i.worstSeverity} />
            <AppText variant="label" style={styles.grow}>
              {i.zoneLabel}
            </AppText>
          </View>
          <AppText>{i.verdictLabel}</AppText>
          {i.reasons.slice(0, 2).map((r) => (
            <AppText key={r} variant="caption" muted>
              • {r}
            </AppText>
          ))}
          <AppText variant="caption">
            {hours(i.hours)} · {money(i.totalCost, currency)}
            {i.boardFeet ? ` · ${i.boardFeet.toFixed(2)} bd ft` : ''}
          </AppText>
        </Card>
      ))}
    </Section>
  );
}

function Line({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.line} testID={testID}>
      <AppText style={styles.grow}>{label}</AppText>
      <AppText variant="label">{value}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: spacing.lg },
  grade: {
    gap: spacing.xs,
    padding: spacing.md,
    borderLeftWidth: 4,
    borderLeftColor: colors.accent,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  columns: { gap: spacing.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { flex: 1, gap: spacing.lg, minWidth: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flexShrink: 1, flexGrow: 1 },
  line: { flexDirection: 'row', gap: spacing.md, alignItems: 'baseline', flexWrap: 'wrap' },
  step: { gap: 2 },
  overdue: { color: colors.danger },
});
