import { useLocalSearchParams } from 'expo-router';
import {
  getBodyPlan,
  getZone,
  STRUCTURAL_CLASS_LABELS,
  TRADE_NAME_LABELS,
} from '@/shared/body-plans';
import { useDecisions } from '@/src/api/decisions';
import { useFindings } from '@/src/api/findings';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { canDecide } from '@/src/components/decisions/can-decide';
import { DecisionEditor } from '@/src/components/decisions/decision-editor';
import { DecisionSummary } from '@/src/components/decisions/decision-summary';
import { goBack } from '@/src/components/nav/go-back';
import { AppText, Button, EmptyState, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { StructuralCaution } from '@/src/components/wood/structural-caution';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

/** The member decision for one zone: an editor for those who decide, the saved decision for others. */
export default function MemberDecision() {
  const { vehicleId, zoneKey } = useLocalSearchParams<{ vehicleId: string; zoneKey: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const { wide } = useBreakpoint();
  const vehicle = useVehicle(wid, vehicleId);
  const findings = useFindings(wid, vehicleId, { zone: zoneKey });
  const decisions = useDecisions(wid, vehicleId);
  const settings = useWorkshopSettings(wid);
  const queries = [vehicle, findings, decisions, settings];
  const back = () =>
    goBack({ pathname: '/vehicles/[vehicleId]', params: { vehicleId, zone: zoneKey } });

  if (queries.some((q) => q.isPending)) return <LoadingView label="Loading the member…" />;
  const failed = queries.find((q) => q.isError);
  if (failed || !vehicle.data || !findings.data || !decisions.data || !settings.data)
    return (
      <Screen title="Member decision">
        <ErrorView error={failed?.error} onRetry={() => failed?.refetch()} />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  const zone = plan ? getZone(plan, zoneKey) : undefined;
  const backButton = (
    <Button label="Back to the vehicle" variant="secondary" compact onPress={back} />
  );
  if (!plan || !zone)
    return (
      <Screen title="Member decision" subtitle={vehicleTitle(vehicle.data)} actions={backButton}>
        <EmptyState
          title="This member is not on the vehicle's body plan"
          message="Open the vehicle and choose a zone on the drawing."
        />
      </Screen>
    );
  const decision = decisions.data.find((d) => d.zoneKey === zone.key) ?? null;
  const deciding = canDecide(role);

  return (
    <Screen
      title={deciding ? `Decide: ${zone.label}` : `${zone.label}: repair decision`}
      subtitle={`${vehicleTitle(vehicle.data)} · ${TRADE_NAME_LABELS[zone.tradeName]} · ${STRUCTURAL_CLASS_LABELS[zone.structuralClass]}`}
      actions={backButton}
      maxWidth={wide ? 1280 : 880}
      testID="decision-screen"
    >
      {deciding ? (
        <DecisionEditor
          // A decision made or withdrawn elsewhere starts the editor afresh once it is loaded.
          key={decision?.id ?? 'new'}
          wid={wid}
          vehicleId={vehicleId}
          plan={plan}
          zone={zone}
          findings={findings.data}
          decisions={decisions.data}
          settings={settings.data}
        />
      ) : (
        <>
          {decision ? (
            <DecisionSummary decision={decision} currency={settings.data.currency} detail="full" />
          ) : (
            <AppText muted testID="decision-none">
              No repair decision has been made for this member yet.
            </AppText>
          )}
          <StructuralCaution />
        </>
      )}
    </Screen>
  );
}
