import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { BandSwatch, InsideSwatch, OutsideSwatch } from '@/components/charts/marks';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

function Item({ swatch, label }: { swatch: ReactNode; label: string }) {
  return (
    <View style={styles.item} role="listitem">
      {swatch}
      <ThemedText variant="caption">{label}</ThemedText>
    </View>
  );
}

/** What the chart's marks mean; wraps onto more lines on a narrow screen. Without a band there is no range to be in or out of. */
export function TrendLegend({ hasBand }: { hasBand: boolean }) {
  const { palette } = useTheme();
  return (
    <View style={styles.row} role="list" aria-label="Legend">
      {hasBand ? (
        <>
          <Item swatch={<BandSwatch fill={palette.okSoft} edge={palette.ok} />} label="target range" />
          <Item swatch={<InsideSwatch ink={palette.primary} halo={palette.surface} />} label="in range" />
          <Item swatch={<OutsideSwatch outInk={palette.danger} halo={palette.surface} />} label="out of range (▲ high, ▼ low)" />
        </>
      ) : (
        <Item swatch={<InsideSwatch ink={palette.primary} halo={palette.surface} />} label="result (no target range set)" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.xxs },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs, flexShrink: 1 },
});
