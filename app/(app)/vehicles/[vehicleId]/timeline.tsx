import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { TIMELINE_KINDS, type TimelineKind } from '@/shared/schemas/recheck';
import { useTimeline } from '@/src/api/timeline';
import { useVehicle } from '@/src/api/vehicles';
import { TIMELINE_KIND_LABELS, TimelineList } from '@/src/components/timeline/timeline-list';
import { AppText, ChipToggle, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

/** Surveys, findings, treatments and re-checks of one vehicle in one list, filtered by kind. */
export default function Timeline() {
  const { vehicleId } = useLocalSearchParams<{ vehicleId: string }>();
  const wid = useWorkshopId();
  const vehicle = useVehicle(wid, vehicleId);
  const [kinds, setKinds] = useState<TimelineKind[]>([...TIMELINE_KINDS]);
  const timeline = useTimeline(wid, vehicleId, kinds);
  const plan = vehicle.data ? getBodyPlan(vehicle.data.bodyPlanKey) : undefined;
  const toggle = (k: TimelineKind, on: boolean) => {
    const next = TIMELINE_KINDS.filter((x) => (x === k ? on : kinds.includes(x)));
    // At least one kind stays chosen: an empty filter would mean "everything" to the server.
    if (next.length) setKinds(next);
  };

  return (
    <Screen
      title="Timeline"
      subtitle={vehicle.data ? vehicleTitle(vehicle.data) : undefined}
      testID="timeline-screen"
    >
      <View style={styles.chips} accessibilityLabel="Show">
        {TIMELINE_KINDS.map((k) => (
          <ChipToggle
            key={k}
            label={TIMELINE_KIND_LABELS[k]}
            checked={kinds.includes(k)}
            onChange={(on) => toggle(k, on)}
            testID={`timeline-filter-${k}`}
          />
        ))}
      </View>
      {timeline.isPending ? (
        <LoadingView label="Loading the timeline…" />
      ) : timeline.isError ? (
        <ErrorView error={timeline.error} onRetry={() => timeline.refetch()} />
      ) : (
        <>
          {timeline.isPlaceholderData ? (
            <AppText variant="caption" muted testID="timeline-updating">
              Updating the list…
            </AppText>
          ) : null}
          <TimelineList items={timeline.data} zoneLabel={(k) => zoneLabel(plan, k)} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
