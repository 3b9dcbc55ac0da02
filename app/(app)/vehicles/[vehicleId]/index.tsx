import { router, useLocalSearchParams } from 'expo-router';
import { useCallback, useMemo, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  getBodyPlan,
  polygonCentroid,
  VIEW_KEYS,
  zoneLabel,
  type BodyPlan,
  type ViewKey,
} from '@/shared/body-plans';
import { can } from '@/shared/roles';
import type { FindingResponse } from '@/shared/schemas';
import { useDecisions } from '@/src/api/decisions';
import { useFindings } from '@/src/api/findings';
import { useVehicleRechecks } from '@/src/api/rechecks';
import { useZoneStates } from '@/src/api/treatments';
import { useSurveys } from '@/src/api/surveys';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { canDecide } from '@/src/components/decisions/can-decide';
import { pinsForView, summarizeZones, type ViewPoint } from '@/src/components/body-diagram';
import {
  DiagramPanel,
  revealTop,
  SurveyBar,
  sortSurveys,
  VehicleFacts,
} from '@/src/components/findings/overview';
import {
  AppText,
  Button,
  ConfirmDialog,
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
} from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { VehicleRechecks } from '@/src/components/rechecks/vehicle-rechecks';
import { zoneStateMap } from '@/src/components/treatments/zone-state-map';
import { ZoneSheet } from '@/src/components/zone-sheet';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { colors, radius, spacing } from '@/src/theme';

type Selection = { zone: string; point?: ViewPoint };

/** Vehicle overview: facts, the zoned diagram, and the chosen zone's sheet (beside it when wide). */
export default function VehicleOverview() {
  const params = useLocalSearchParams<{ vehicleId: string; zone?: string; view?: string }>();
  const vehicleId = params.vehicleId;
  const wid = useWorkshopId();
  const role = useRole();
  const { wide } = useBreakpoint();
  const vehicle = useVehicle(wid, vehicleId);
  const surveys = useSurveys(wid, vehicleId);
  const findings = useFindings(wid, vehicleId);
  const decisions = useDecisions(wid, vehicleId);
  const settings = useWorkshopSettings(wid);
  const zoneStateList = useZoneStates(wid, vehicleId);
  const rechecks = useVehicleRechecks(wid, vehicleId);
  const zoneStates = useMemo(() => zoneStateMap(zoneStateList.data), [zoneStateList.data]);
  const [surveyFilter, setSurveyFilter] = useState('all');
  const [view, setView] = useState<ViewKey | null>(isViewKey(params.view) ? params.view : null);
  const [selected, setSelected] = useState<Selection | null>(
    params.zone ? { zone: params.zone } : null,
  );
  const [askSurvey, setAskSurvey] = useState(false);

  const plan = vehicle.data ? getBodyPlan(vehicle.data.bodyPlanKey) : undefined;
  const viewKey =
    view && plan?.views.some((v) => v.key === view) ? view : (plan?.views[0].key ?? 'left');
  const sorted = useMemo(() => sortSurveys(surveys.data ?? []), [surveys.data]);
  const visible = useMemo(
    () =>
      (findings.data ?? []).filter((f) => surveyFilter === 'all' || f.surveyId === surveyFilter),
    [findings.data, surveyFilter],
  );
  const summaries = useMemo(() => summarizeZones(visible), [visible]);
  const pins = useMemo(() => pinsForView(visible, viewKey), [visible, viewKey]);
  const panelRef = useRef<View>(null);
  const onZonePress = useCallback(
    (zone: string, point?: ViewPoint) => {
      setSelected({ zone, point });
      if (!wide) revealTop(panelRef);
    },
    [wide],
  );

  if (vehicle.isPending) return <LoadingView label="Loading the vehicle…" />;
  if (vehicle.isError)
    return (
      <Screen title="Vehicle">
        <ErrorView error={vehicle.error} onRetry={() => vehicle.refetch()} />
      </Screen>
    );
  const v = vehicle.data;
  const canFindings = can(role, 'findings.write');
  const targetSurvey = surveyFilter !== 'all' ? surveyFilter : sorted[0]?.id;
  const startSurvey = () => router.push(`/vehicles/${vehicleId}/surveys/new`);
  const canTreat = can(role, 'treatments.write');
  const recordTreatment = (zone?: string) =>
    router.push({
      pathname: '/vehicles/[vehicleId]/treatments/new',
      params: zone ? { vehicleId, zone } : { vehicleId },
    });

  function logFinding(zone: string) {
    if (!targetSurvey) return setAskSurvey(true);
    const point =
      selected?.zone === zone ? (selected.point ?? centroidIn(plan!, viewKey, zone)) : undefined;
    router.push({
      pathname: '/vehicles/[vehicleId]/findings/new',
      params: {
        vehicleId,
        zone,
        surveyId: targetSurvey,
        ...(point ? { view: viewKey, x: String(point.x), y: String(point.y) } : {}),
      },
    });
  }
  const editFinding = (f: FindingResponse) =>
    router.push({
      pathname: '/vehicles/[vehicleId]/findings/[findingId]',
      params: { vehicleId, findingId: f.id },
    });

  const sheet =
    plan && selected ? (
      <ZoneSheet
        plan={plan}
        zoneKey={selected.zone}
        findings={visible.filter((f) => f.zoneKey === selected.zone)}
        canLog={canFindings}
        canEdit={canFindings}
        decision={decisions.data?.find((d) => d.zoneKey === selected.zone) ?? null}
        currency={settings.data?.currency}
        canDecide={canDecide(role)}
        onDecide={() =>
          router.push({
            pathname: '/vehicles/[vehicleId]/decisions/[zoneKey]',
            params: { vehicleId, zoneKey: selected.zone },
          })
        }
        zoneState={zoneStates[selected.zone]}
        onRecordTreatment={canTreat ? () => recordTreatment(selected.zone) : undefined}
        onLogFinding={() => logFinding(selected.zone)}
        onEditFinding={editFinding}
        onOpenHistory={() =>
          router.push({
            pathname: '/vehicles/[vehicleId]/zones/[zoneKey]',
            params: { vehicleId, zoneKey: selected.zone },
          })
        }
        onClose={() => setSelected(null)}
      />
    ) : (
      <View style={styles.hint} testID="zone-sheet-hint">
        <AppText variant="label">Choose a zone</AppText>
        <AppText muted>
          Tap a member on the drawing to see what is recorded there
          {canFindings ? ' and log a finding' : ''}.
        </AppText>
      </View>
    );

  return (
    <Screen
      title={vehicleTitle(v)}
      maxWidth={wide ? 1400 : 880}
      testID="vehicle-overview"
      actions={
        <>
          {canTreat ? (
            <Button
              label="Record a treatment"
              variant="secondary"
              compact
              onPress={() => recordTreatment()}
              testID="vehicle-record-treatment"
            />
          ) : null}
          <Button
            label="Repair plan"
            variant="secondary"
            compact
            onPress={() => router.push(`/vehicles/${vehicleId}/plan`)}
            testID="vehicle-plan"
          />
          <Button
            label="Reports"
            variant="secondary"
            compact
            onPress={() => router.push(`/vehicles/${vehicleId}/reports`)}
            testID="vehicle-reports"
          />
          <Button
            label="Timeline"
            variant="secondary"
            compact
            onPress={() => router.push(`/vehicles/${vehicleId}/timeline`)}
            testID="vehicle-timeline"
          />
          {can(role, 'vehicles.write') ? (
            <Button
              label="Edit vehicle"
              variant="secondary"
              compact
              onPress={() => router.push(`/vehicles/${vehicleId}/edit`)}
              testID="vehicle-edit"
            />
          ) : null}
        </>
      }
    >
      <VehicleFacts vehicle={v} plan={plan} findings={findings.data ?? []} />
      {surveys.isError ? (
        <ErrorView
          error={surveys.error}
          onRetry={() => surveys.refetch()}
          title="Surveys could not be loaded"
        />
      ) : (
        <SurveyBar
          surveys={sorted}
          value={surveyFilter}
          onChange={setSurveyFilter}
          onStart={can(role, 'surveys.write') ? startSurvey : undefined}
        />
      )}
      {!plan ? (
        <EmptyState
          title="This body style cannot be drawn"
          message={`The body plan “${v.bodyPlanKey}” is not in this version of Soundframe. Choose another in Edit vehicle.`}
        />
      ) : findings.isError ? (
        <ErrorView
          error={findings.error}
          onRetry={() => findings.refetch()}
          title="Findings could not be loaded"
        />
      ) : (
        <View style={[styles.split, wide && styles.splitWide]}>
          <View style={wide ? styles.diagramWide : undefined} ref={panelRef}>
            <DiagramPanel
              plan={plan}
              view={viewKey}
              onViewChange={setView}
              zoneSummaries={summaries}
              pins={pins}
              selectedZone={selected?.zone}
              onZonePress={onZonePress}
              maxHeight={wide ? 560 : 420}
              canLog={canFindings}
              zoneStates={zoneStates}
            />
            {findings.isPending ? <AppText muted>Loading findings…</AppText> : null}
          </View>
          <View style={wide ? styles.sheetWide : undefined}>{sheet}</View>
        </View>
      )}
      {plan && rechecks.data ? (
        <VehicleRechecks
          vehicleId={vehicleId}
          rechecks={rechecks.data}
          zoneLabel={(k) => zoneLabel(plan, k)}
        />
      ) : null}
      <ConfirmDialog
        visible={askSurvey}
        title="Start a survey first"
        message="Every finding belongs to a dated survey visit. Start today's survey, then log the finding."
        confirmLabel="Start a survey"
        destructive={false}
        onConfirm={() => {
          setAskSurvey(false);
          startSurvey();
        }}
        onCancel={() => setAskSurvey(false)}
      />
    </Screen>
  );
}

function isViewKey(v: string | undefined): v is ViewKey {
  return !!v && (VIEW_KEYS as readonly string[]).includes(v);
}

/** Where to pin a finding whose zone was chosen without a tap point (keyboard, link). */
function centroidIn(plan: BodyPlan, view: ViewKey, zone: string): ViewPoint | undefined {
  const shape = plan.views.find((v) => v.key === view)?.shapes.find((s) => s.zone === zone);
  if (!shape) return undefined;
  const [x, y] = polygonCentroid(shape.points);
  return { x: Math.round(x * 10) / 10, y: Math.round(y * 10) / 10 };
}

const styles = StyleSheet.create({
  split: { gap: spacing.lg },
  splitWide: { flexDirection: 'row', alignItems: 'flex-start' },
  diagramWide: { flex: 3, minWidth: 0 },
  sheetWide: { flex: 2, minWidth: 340, maxWidth: 480 },
  hint: {
    gap: spacing.xs,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.line,
  },
});
