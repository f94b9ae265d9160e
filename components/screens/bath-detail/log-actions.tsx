import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AddAnalysisForm } from '@/components/screens/bath-detail/add-analysis-form';
import { AnalysisImport } from '@/components/screens/bath-detail/analysis-import';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { type Bath } from '@/shared/baths';

type PanelProps = { title: string; openLabel: string; hint: string; testID: string; children: ReactNode };

/** A titled card whose body opens on demand, so a long form does not push the log down a phone screen. */
function Panel({ title, openLabel, hint, testID, children }: PanelProps) {
  const [open, setOpen] = useState(false);
  return (
    <Card style={styles.card} testID={testID}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        {title}
      </ThemedText>
      {/* The label says what pressing does (open or close), since Button carries no expanded state. */}
      <Button label={open ? 'Close' : openLabel} accessibilityLabel={open ? `Close: ${title}` : openLabel} accessibilityHint={open ? undefined : hint} onPress={() => setOpen((v) => !v)} />
      {open ? children : null}
    </Card>
  );
}

/** Adding to the log (chemists, technicians): one analysis by hand, or many from a CSV file. */
export function LogActions({ bath, analystName }: { bath: Bath; analystName: string }) {
  if (bath.status === 'archived') {
    return (
      <Card testID="log-archived">
        <ThemedText variant="label" weight="regular" tone="textMuted">
          This bath is archived, so no analyses are added to it. An admin can restore it.
        </ThemedText>
      </Card>
    );
  }
  return (
    // One under the other at every width: the form's value and unit pairs use the full width.
    <View style={styles.stack}>
      <Panel title="Add an analysis" openLabel="Add an analysis" hint="Opens a form for one analysis" testID="add-analysis">
        <AddAnalysisForm bath={bath} analystName={analystName} />
      </Panel>
      <Panel title="Upload analyses" openLabel="Upload a CSV file" hint="Opens the upload of a CSV file of analyses" testID="upload-analyses">
        <AnalysisImport bath={bath} />
      </Panel>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg, minWidth: 0 },
  card: { gap: space.md },
});
