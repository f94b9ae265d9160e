import { StyleSheet, View } from 'react-native';

import { CautionCard } from '@/components/screens/safety/caution-card';
import { STANDING_CAUTIONS } from '@/components/screens/safety/cautions';
import { TrayIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { EmptyState } from '@/components/ui/empty-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';

/** Safety section: an empty review queue and the standing cautions that always apply. */
export function SafetyScreen() {
  return (
    <ScreenContainer title="Safety" subtitle="Work flagged for review, and the cautions that apply to all of it.">
      <EmptyState
        Icon={TrayIcon}
        title="Nothing waiting for review"
        body="Flagged cyanide work will be listed here for a safety officer to review. Nothing can be flagged in this build yet."
      />
      <View style={styles.section}>
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          Standing cautions
        </ThemedText>
        {STANDING_CAUTIONS.map((caution) => (
          <CautionCard key={caution.key} caution={caution} />
        ))}
        <ThemedText variant="label" weight="semibold" tone="textMuted">
          These cautions do not replace the safety data sheet (SDS), local codes and licensed practice.
        </ThemedText>
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
});
