import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { can } from '@/shared/roles';
import { REPORT_KINDS, type ReportKind } from '@/shared/schemas/report';
import { generateError, useGenerateReport, useReports } from '@/src/api/reports';
import { useVehicle } from '@/src/api/vehicles';
import { ReportCard } from '@/src/components/reports/report-card';
import { AppText, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

/** A vehicle's printed reports: one card per kind, generate, follow progress, download, share. */
export default function VehicleReports() {
  const { vehicleId } = useLocalSearchParams<{ vehicleId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const { wide } = useBreakpoint();
  const vehicle = useVehicle(wid, vehicleId);
  const reports = useReports(wid, vehicleId);
  const generate = useGenerateReport(wid, vehicleId);
  const [errors, setErrors] = useState<Partial<Record<ReportKind, string>>>({});

  if (reports.isPending || vehicle.isPending) return <LoadingView label="Loading the reports…" />;
  if (reports.isError || vehicle.isError)
    return (
      <Screen title="Reports">
        <ErrorView
          error={reports.error ?? vehicle.error}
          onRetry={() => (reports.isError ? reports.refetch() : vehicle.refetch())}
        />
      </Screen>
    );

  const canWrite = can(role, 'reports.write');
  const canShare = can(role, 'reports.share');
  function start(kind: ReportKind) {
    setErrors((e) => ({ ...e, [kind]: undefined }));
    generate.mutate(kind, {
      onError: (e) => setErrors((all) => ({ ...all, [kind]: generateError(e) })),
    });
  }

  return (
    <Screen
      title="Reports"
      subtitle={vehicleTitle(vehicle.data)}
      maxWidth={wide ? 1200 : 880}
      testID="reports-screen"
    >
      {reports.data.length === 0 ? (
        <AppText muted testID="reports-empty">
          No reports yet for this vehicle.{' '}
          {canWrite
            ? 'A report is a PDF made from the latest survey, the member decisions and the treatments; generate one below.'
            : 'The workshop has not generated one yet.'}
        </AppText>
      ) : null}
      <View style={[styles.cards, wide && styles.cardsWide]}>
        {REPORT_KINDS.map((kind) => (
          <View key={kind} style={wide ? styles.cardWide : undefined}>
            <ReportCard
              kind={kind}
              versions={reports.data.filter((r) => r.kind === kind)}
              onGenerate={canWrite ? () => start(kind) : undefined}
              generating={generate.isPending && generate.variables === kind}
              error={errors[kind]}
              onShare={
                canShare
                  ? (r) =>
                      router.push({
                        pathname: '/vehicles/[vehicleId]/reports/[reportId]',
                        params: { vehicleId, reportId: r.id },
                      })
                  : undefined
              }
            />
          </View>
        ))}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.lg },
  cardsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  cardWide: { flex: 1, minWidth: 0 },
});
