import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { HazardBanner } from '@/components/hazards/hazard-banner';
import { useCalculationHazards } from '@/components/hazards/use-calculation-hazards';
import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ConstantsUsed } from '@/components/screens/calculate/constants-used';
import { SaveRunCard } from '@/components/screens/calculate/save-run-card';
import { SolidsChoice } from '@/components/screens/calculate/solids-choice';
import { SpeciationResult } from '@/components/screens/calculate/speciation-result';
import { SystemForm } from '@/components/screens/calculate/system-form';
import { useSystemForm } from '@/components/screens/calculate/use-system-form';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { errorsFromApi } from '@/lib/api/form-errors';
import { useMe } from '@/lib/api/use-me';
import { useBuildSystem } from '@/lib/api/use-system';
import { solve, type SolveResult } from '@/lib/engine';
import { hasRole } from '@/shared/auth';
import { type BuiltSystem, type SystemRequest } from '@/shared/constants';

/** The last calculation: what was asked, what the library built, and what the engine made of it here. */
type Outcome = { version: number; request: SystemRequest; built: BuiltSystem; result: SolveResult | null; engineError?: string };

function solveHere(built: BuiltSystem): { result: SolveResult | null; engineError?: string } {
  try {
    return { result: solve(built.problem) };
  } catch (error) {
    // EngineInputError carries a message for chemists; anything else is still said in words.
    return { result: null, engineError: error instanceof Error ? error.message : 'The engine could not work this system out.' };
  }
}

function ResultPanel({ outcome, stale }: { outcome: Outcome | null; stale: boolean }) {
  if (!outcome) {
    return (
      <ThemedText variant="body" tone="textMuted">
        Choose at least one metal ion, give each chosen ion its total, then press Calculate.
      </ThemedText>
    );
  }
  const { built, result, request } = outcome;
  return <ShownResult outcome={outcome} stale={stale} built={built} result={result} request={request} />;
}

function ShownResult({ outcome, stale, built, result, request }: { outcome: Outcome; stale: boolean; built: BuiltSystem; result: SolveResult | null; request: SystemRequest }) {
  const shown = useMemo(() => ({ calculator: 'speciation' as const, request, problem: built.problem, params: {} }), [request, built]);
  const hazards = useCalculationHazards(shown);
  const draftIds = new Set(built.drafts.map((d) => d.id));
  const constants = built.constants.map((c) => (draftIds.has(c.id) ? { ...c, status: 'draft' as const } : c));
  return (
    <View style={styles.panel}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Result
      </ThemedText>
      {stale ? <CautionNote testID="stale" message="The inputs changed since this result was worked out. Press Calculate again." /> : null}
      <HazardBanner hazards={hazards} compact />
      {built.drafts.length > 0 ? (
        <CautionNote message={`This result uses ${built.drafts.length} draft value${built.drafts.length === 1 ? '' : 's'} not yet reviewed.`} />
      ) : null}
      {built.warnings.map((w) => (
        <CautionNote key={w} message={w} />
      ))}
      {outcome.engineError ? <Notice kind="error" message={outcome.engineError} /> : null}
      {result ? <SpeciationResult problem={built.problem} result={result} metals={request.metals} /> : null}
      <ConstantsUsed constants={constants} note="Worked out in this browser from the library as it is now; not saved." />
    </View>
  );
}

/** Speciation from the library: choose ions and totals, build the system on the server, solve it here, optionally save. */
export function SystemScreen() {
  const form = useSystemForm();
  const build = useBuildSystem();
  const me = useMe().data;
  const wide = useIsWide();
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  const calculate = async () => {
    if (build.isMutating) return;
    const check = form.toRequest();
    if (!check.ok) return form.setErrors(check.errors);
    form.setErrors({ fields: {} });
    try {
      const built = await build.trigger(check.request);
      setOutcome({ version: form.version, request: check.request, built, ...solveHere(built) });
    } catch (error) {
      form.setErrors(errorsFromApi(error, form.knownFields()));
    }
  };

  const canSave = hasRole(me, 'chemist', 'technician');
  const inputs = (
    <View style={[styles.column, wide && styles.inputs]}>
      <Card style={styles.card} testID="system-inputs">
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          The solution
        </ThemedText>
        {form.errors.form ? <Notice kind="error" message={form.errors.form} /> : null}
        <SystemForm form={form} disabled={build.isMutating} onSubmit={() => void calculate()} />
        {outcome ? (
          <SolidsChoice
            available={outcome.built.availableSolids}
            chosen={form.solids}
            disabled={build.isMutating}
            onToggle={(name) => form.toggleSolid(name, outcome.built.availableSolids)}
          />
        ) : null}
        <Button label="Calculate" busyLabel="Calculating…" busy={build.isMutating} variant="primary" onPress={() => void calculate()} />
      </Card>
      {canSave ? (
        <SaveRunCard form={form} disabled={build.isMutating} />
      ) : me ? (
        <ThemedText variant="caption" tone="textMuted">
          Saving runs is for chemists and technicians.
        </ThemedText>
      ) : null}
    </View>
  );
  const results = (
    <View style={[styles.column, wide && styles.results]}>
      <ResultPanel outcome={outcome} stale={!!outcome && outcome.version !== form.version} />
    </View>
  );
  return (
    <ScreenContainer
      title="Speciation"
      subtitle="Where each metal sits at equilibrium, worked out from the reviewed constants in the library."
      back={{ href: '/calculate', label: 'Calculate' }}
    >
      <View style={wide ? styles.row : styles.stack}>
        {inputs}
        {results}
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  stack: { gap: space.xl },
  column: { gap: space.lg, minWidth: 0 },
  inputs: { flex: 1 },
  results: { flex: 1.3 },
  card: { gap: space.md },
  panel: { gap: space.md },
});
