import { useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import type { DecisionResponse, WorkshopSettings } from '@/shared/schemas';
import { cleanError } from '@/src/api/client';
import { decisionQueries, useDeleteDecision, useSaveDecision } from '@/src/api/decisions';
import type { Face } from '@/src/components/findings/form-values';
import { FIELDS_NEED_ATTENTION, saveFailure, useToast } from '@/src/components/ui';
import {
  parseInputs,
  pathsOf,
  prefillValues,
  saveBody,
  tryComputeDecision,
  type DecisionErrors,
  type DecisionFormValues,
  type ZoneContext,
} from './decision-values';

type Args = {
  wid: string;
  vehicleId: string;
  ctx: ZoneContext;
  decision: DecisionResponse | null;
  settings: WorkshopSettings;
};

const NEED_REASON = 'Say why you chose another option than the recommended one';

/**
 * The decision form's state: values, the live recommendation and estimate, and saving with the
 * server's answers (400 beside the fields, 409 offered a reload).
 */
export function useDecisionForm({ wid, vehicleId, ctx, decision, settings }: Args) {
  const queryClient = useQueryClient();
  const toast = useToast();
  const units = settings.units;
  const zoneKey = ctx.zone.key;
  const [saved, setSaved] = useState(decision);
  const [values, setValues] = useState(() => prefillValues(ctx, decision, units));
  const [baseline, setBaseline] = useState(values);
  const [submitErrors, setSubmitErrors] = useState<DecisionErrors>({});
  const [conflict, setConflict] = useState(false);
  const save = useSaveDecision(wid, vehicleId, zoneKey);
  const remove = useDeleteDecision(wid, vehicleId, zoneKey);

  const parsed = useMemo(() => parseInputs(values, units), [values, units]);
  const computed = useMemo(
    () => (parsed.inputs ? tryComputeDecision(parsed.inputs, values.chosen, ctx, settings) : null),
    [parsed.inputs, values.chosen, ctx, settings],
  );
  const model = computed?.model ?? null;
  const errors = { ...parsed.errors, ...computed?.errors, ...submitErrors };
  const dirty = JSON.stringify(values) !== JSON.stringify(baseline);

  function change(patch: Partial<DecisionFormValues>, face?: Face) {
    setValues((v) => ({ ...v, ...patch }));
    const cleared = new Set(
      (Object.keys(patch) as (keyof DecisionFormValues)[]).flatMap((k) => pathsOf(k, face)),
    );
    setSubmitErrors((e) => Object.fromEntries(Object.entries(e).filter(([k]) => !cleared.has(k))));
  }

  function startFrom(d: DecisionResponse | null) {
    const next = prefillValues(ctx, d, units);
    setSaved(d);
    setValues(next);
    setBaseline(next);
    setSubmitErrors({});
  }

  async function submit() {
    if (!parsed.inputs || !model) {
      toast.show('Some measurements need attention. See the messages beside them.', {
        kind: 'error',
      });
      return;
    }
    if (model.overriding && !values.overrideReason.trim()) {
      setSubmitErrors({ overrideReason: NEED_REASON });
      return;
    }
    try {
      const d = await save.mutateAsync(saveBody(parsed.inputs, model, values, saved?.version));
      // The saved choice is pinned, so a later change of the inputs does not silently change it.
      const next = { ...values, chosen: d.chosenOption };
      setSaved(d);
      setValues(next);
      setBaseline(next);
      setSubmitErrors({});
      toast.show('Decision saved', { kind: 'success' });
    } catch (e) {
      const f = saveFailure(e);
      if (f.conflict) return setConflict(true);
      if (f.message === null) setSubmitErrors(f.fields);
      toast.show(f.message ?? FIELDS_NEED_ATTENTION, { kind: 'error' });
    }
  }

  async function reload() {
    try {
      const items = await queryClient.fetchQuery({
        ...decisionQueries.list(wid, vehicleId),
        staleTime: 0,
      });
      startFrom(items.find((d) => d.zoneKey === zoneKey) ?? null);
      setConflict(false);
    } catch (e) {
      toast.show(cleanError(e), { kind: 'error' });
    }
  }

  async function withdraw() {
    try {
      await remove.mutateAsync();
      startFrom(null);
      toast.show('Decision withdrawn; the member is undecided again.', { kind: 'success' });
    } catch (e) {
      toast.show(cleanError(e), { kind: 'error' });
    }
  }

  return {
    values,
    change,
    errors,
    model,
    saved,
    dirty,
    conflict,
    busy: save.isPending,
    withdrawing: remove.isPending,
    submit,
    reload,
    withdraw,
  };
}
