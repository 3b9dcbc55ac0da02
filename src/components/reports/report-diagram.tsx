import { useState } from 'react';
import { StyleSheet } from 'react-native';
import { getBodyPlan, getZone, type ViewKey } from '@/shared/body-plans';
import type { ReportSummary } from '@/shared/schemas/report';
import { BodyDiagram, DiagramLegend, ViewSwitcher } from '@/src/components/body-diagram';
import { AppText, Card } from '@/src/components/ui';
import { spacing } from '@/src/theme';

/**
 * The body drawing of a shared report: the same shading, numbers and hatching as the PDF, for a
 * reader without an account. Tapping a member names it and its worst severity; nothing else opens.
 */
export function ReportDiagram({ diagram }: { diagram: NonNullable<ReportSummary['diagram']> }) {
  const plan = getBodyPlan(diagram.bodyPlanKey);
  const [view, setView] = useState<ViewKey>(plan?.views[0].key ?? 'left');
  const [picked, setPicked] = useState<string | null>(null);
  if (!plan) return null;
  const zone = picked ? getZone(plan, picked) : undefined;
  const summary = picked ? diagram.zones[picked] : undefined;
  return (
    <Card style={styles.card} testID="public-diagram">
      <ViewSwitcher plan={plan} value={view} onChange={setView} />
      <BodyDiagram
        plan={plan}
        view={view}
        zoneSummaries={diagram.zones}
        pins={[]}
        selectedZone={picked ?? undefined}
        onZonePress={setPicked}
        maxHeight={320}
        testID="public-body-diagram"
      />
      <AppText variant="caption" muted testID="public-diagram-zone">
        {zone
          ? summary
            ? `${zone.label}: worst severity ${summary.worstSeverity}, ${summary.count === 1 ? '1 finding' : `${summary.count} findings`}.`
            : `${zone.label}: nothing recorded.`
          : 'Tap a member to see its name and worst severity.'}
      </AppText>
      <DiagramLegend />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { padding: spacing.md },
});
