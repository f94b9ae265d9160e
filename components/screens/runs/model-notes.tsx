import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { type Run } from '@/shared/constants';

/** Every warning once: the system's (from building it) and the solver's, in the order first seen. */
export function runWarnings(run: Pick<Run, 'warnings' | 'result'>): string[] {
  return [...new Set([...run.warnings, ...run.result.warnings])];
}

function Line({ label, value }: { label: string; value: string }) {
  return (
    <ThemedText variant="label" weight="regular" selectable>
      <ThemedText variant="label" tone="textMuted">{`${label}: `}</ThemedText>
      {value}
    </ThemedText>
  );
}

/** How the model treated the bath: activity model, ionic strength, how well it settled, and its warnings. */
export function ModelNotes({ run }: { run: Pick<Run, 'warnings' | 'result'> }) {
  const { result } = run;
  const settled = result.status === 'converged';
  const warnings = runWarnings(run);
  const temperature = Number.isFinite(result.temperatureC) ? `${result.temperatureC} °C` : 'temperature not known';
  return (
    <View style={styles.section} testID="model-notes">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Model notes
      </ThemedText>
      <Line
        label="Activity model"
        value={`${result.activity === 'davies' ? 'Davies (activities corrected for ionic strength)' : 'ideal (no activity corrections)'} at ${temperature}`}
      />
      <Line label="Ionic strength" value={settled ? `${formatNumber(result.ionicStrength)} mol/L` : 'not known (the solver did not settle)'} />
      <Line label="Mass-balance residual" value={`${formatNumber(result.residual, 2)} (largest, relative)`} />
      <Line
        label="Solver"
        value={settled ? `settled after ${result.iterations} iterations` : `did not settle after ${result.iterations} iterations${result.message ? `: ${result.message}` : ''}`}
      />
      {warnings.length === 0 ? (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          No warnings from the model.
        </ThemedText>
      ) : (
        warnings.map((w) => <CautionNote key={w} message={w} />)
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.xs },
});
