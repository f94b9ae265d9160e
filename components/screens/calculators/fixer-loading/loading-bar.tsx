import { StyleSheet, View } from 'react-native';
import Svg, { Line, Rect } from 'react-native-svg';

import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** Height of the bar, px. */
const BAR_HEIGHT = 22;

type Props = {
  /** Loading, 0..100 % of capacity. */
  percent: number;
  /** Fixed width for print (px); otherwise the bar fills its column. */
  width?: number;
};

/** The loading as a horizontal bar from empty to full, with tick marks at each quarter and the figure in words above it. */
export function LoadingBar({ percent, width }: Props) {
  const { palette } = useTheme();
  const p = Math.max(0, Math.min(100, percent));
  const words = `${formatNumber(p)} % of capacity used, ${formatNumber(100 - p)} % left`;
  return (
    <View style={styles.box} testID="loading-bar">
      <ThemedText variant="label">{words}</ThemedText>
      <View accessible accessibilityRole="image" accessibilityLabel={`Loading bar: ${words}`} style={width ? { width, maxWidth: '100%' } : styles.fill}>
        <Svg width="100%" height={BAR_HEIGHT} viewBox={`0 0 100 ${BAR_HEIGHT}`} preserveAspectRatio="none" aria-hidden>
          <Rect x={0} y={0} width={100} height={BAR_HEIGHT} fill={palette.primarySoft} />
          <Rect x={0} y={0} width={p} height={BAR_HEIGHT} fill={p >= 100 ? palette.danger : palette.primary} />
          {[25, 50, 75].map((t) => (
            <Line key={t} x1={t} x2={t} y1={BAR_HEIGHT - 6} y2={BAR_HEIGHT} stroke={palette.border} strokeWidth={0.4} />
          ))}
          <Rect x={0} y={0} width={100} height={BAR_HEIGHT} fill="none" stroke={palette.textMuted} strokeWidth={0.4} />
        </Svg>
      </View>
      <View style={styles.scale}>
        <ThemedText variant="caption" tone="textMuted">
          Fresh
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          Saturated
        </ThemedText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xxs, alignSelf: 'stretch' },
  fill: { alignSelf: 'stretch' },
  scale: { flexDirection: 'row', justifyContent: 'space-between' },
});
