import { useState } from 'react';
import { ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import type { BodyPlan, ViewKey } from '@/shared/body-plans';
import {
  BodyDiagram,
  DiagramLegend,
  ViewSwitcher,
  type DiagramPin,
  type ViewPoint,
  type ZoneStateCue,
  type ZoneSummary,
} from '@/src/components/body-diagram';
import { AppText, Button, Card } from '@/src/components/ui';
import { spacing } from '@/src/theme';

// Enlarged, a phone-width drawing gets members a fingertip wide; it then scrolls sideways.
const ZOOM = 2.2;

/** View buttons, the drawing (fitted or enlarged) and its legend, as one card. */
export function DiagramPanel({
  plan,
  view,
  onViewChange,
  zoneSummaries,
  pins,
  selectedZone,
  onZonePress,
  maxHeight,
  canLog,
  zoneStates,
}: {
  plan: BodyPlan;
  view: ViewKey;
  onViewChange(view: ViewKey): void;
  zoneSummaries: Record<string, ZoneSummary>;
  pins: DiagramPin[];
  selectedZone?: string;
  onZonePress(zoneKey: string, point?: ViewPoint): void;
  maxHeight?: number;
  canLog: boolean;
  zoneStates?: Record<string, ZoneStateCue>;
}) {
  const [zoomed, setZoomed] = useState(false);
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));
  const diagram = (
    <BodyDiagram
      plan={plan}
      view={view}
      zoneSummaries={zoneSummaries}
      pins={pins}
      selectedZone={selectedZone}
      zoneStates={zoneStates}
      onZonePress={onZonePress}
      maxHeight={zoomed && maxHeight ? maxHeight * ZOOM : maxHeight}
      width={zoomed && width ? width * ZOOM : undefined}
      testID="body-diagram"
    />
  );
  return (
    <Card style={styles.card}>
      <ViewSwitcher plan={plan} value={view} onChange={onViewChange} />
      <View style={styles.hintRow}>
        <AppText variant="caption" muted style={styles.hint}>
          {canLog
            ? 'Tap a member to see its findings, or to log one where you tapped.'
            : 'Tap a member to see its findings.'}
        </AppText>
        <Button
          label={zoomed ? 'Fit to screen' : 'Enlarge'}
          variant="ghost"
          compact
          onPress={() => setZoomed(!zoomed)}
          accessibilityLabel={zoomed ? 'Fit the drawing to the screen' : 'Enlarge the drawing'}
          testID="diagram-zoom"
        />
      </View>
      <View onLayout={onLayout}>
        {zoomed ? (
          <ScrollView horizontal contentContainerStyle={styles.scroller} testID="diagram-scroller">
            {diagram}
          </ScrollView>
        ) : (
          diagram
        )}
      </View>
      <DiagramLegend />
      {zoneStates && Object.values(zoneStates).some((z) => z.state !== 'no-evidence') ? (
        <AppText variant="caption" muted testID="zone-state-legend">
          Words under a zone give its treatment state: ACTIVE (solid outline), WATCH = treated,
          watching (dashed), CLEAR = cleared (dotted), OLD = old damage (dash-dot). “!” marks a
          possible treatment failure.
        </AppText>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { padding: spacing.md },
  hintRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  hint: { flex: 1 },
  scroller: { flexGrow: 0 },
});
