import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { TrendLegend } from '@/components/charts/trend-legend';
import { PointMark } from '@/components/charts/marks';
import { monthDay, yearSpan } from '@/components/charts/scale';
import {
  axisTitle,
  FRAME,
  linePath,
  placePoints,
  trendGeometry,
  trendSummary,
  type PlacedPoint,
  type TrendBand,
  type TrendGeometry,
  type TrendPoint,
} from '@/components/charts/trend-model';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

export { axisTitle, type TrendBand, type TrendPoint } from '@/components/charts/trend-model';

/** Height of the drawing in px; the width follows the space the chart is given. */
export const TREND_HEIGHT = 220;
/** Width drawn before the first layout pass reports the real one (px). */
const FIRST_WIDTH = 320;

type Props = {
  /** What is plotted ("Free KCN"); also the chart's heading. */
  title: string;
  /** Unit of the values ("g/L"), or null for a unitless quantity such as pH. */
  unit: string | null;
  points: readonly TrendPoint[];
  /** Target range drawn as a shaded band; either end may be open. */
  band?: TrendBand | null;
  height?: number;
  testID?: string;
};

type DrawProps = { placed: readonly PlacedPoint[]; band?: TrendBand | null; g: TrendGeometry; width: number; height: number; yTitle: string };

/** The SVG itself: band, grid, axes with ticks and labels, the line and its points. */
function Drawing({ placed, band, g, width, height, yTitle }: DrawProps) {
  const { palette, typeface } = useTheme();
  const font = { fontFamily: typeface('regular').fontFamily, fontSize: 11, fill: palette.textMuted };
  const hasBand = !!band && (band.min !== null || band.max !== null);
  const bandTop = band?.max != null ? g.y(band.max) : g.top;
  const bandBottom = band?.min != null ? g.y(band.min) : g.bottom;
  const first = placed[0]?.t ?? 0;
  const last = placed[placed.length - 1]?.t ?? first;
  return (
    <Svg width={width} height={height} aria-hidden>
      <SvgText {...font} fill={palette.text} fontSize={12} x={2} y={14}>
        {yTitle}
      </SvgText>
      {hasBand ? (
        <G>
          <Rect x={g.left} y={bandTop} width={g.right - g.left} height={Math.max(0, bandBottom - bandTop)} fill={palette.okSoft} />
          {band?.max != null ? <Line x1={g.left} x2={g.right} y1={bandTop} y2={bandTop} stroke={palette.ok} strokeDasharray="4 3" /> : null}
          {band?.min != null ? <Line x1={g.left} x2={g.right} y1={bandBottom} y2={bandBottom} stroke={palette.ok} strokeDasharray="4 3" /> : null}
        </G>
      ) : null}
      {g.yTicks.ticks.map((v, i) => (
        <G key={`y${v}`}>
          <Line x1={g.left} x2={g.right} y1={g.y(v)} y2={g.y(v)} stroke={palette.border} strokeWidth={0.75} />
          <SvgText {...font} x={g.left - FRAME.tickGap} y={g.y(v) + 4} textAnchor="end">
            {g.yLabels[i]}
          </SvgText>
        </G>
      ))}
      {g.xTicks.map((t) => (
        <G key={`x${t}`}>
          <Line x1={g.x(t)} x2={g.x(t)} y1={g.bottom} y2={g.bottom + 4} stroke={palette.textMuted} />
          <SvgText {...font} x={g.x(t)} y={g.bottom + 16} textAnchor="middle">
            {monthDay(t)}
          </SvgText>
        </G>
      ))}
      <Line x1={g.left} x2={g.left} y1={g.top} y2={g.bottom} stroke={palette.textMuted} />
      <Line x1={g.left} x2={g.right} y1={g.bottom} y2={g.bottom} stroke={palette.textMuted} />
      <SvgText {...font} x={(g.left + g.right) / 2} y={height - 6} textAnchor="middle">
        {`Date sampled, ${yearSpan(first, last)}`}
      </SvgText>
      {placed.length > 1 ? <Path d={linePath(placed, g)} stroke={palette.primary} strokeWidth={2} fill="none" /> : null}
      {placed.map((p) => (
        <PointMark key={p.key} x={g.x(p.t)} y={g.y(p.value)} kind={p.kind} ink={palette.primary} outInk={palette.danger} halo={palette.surface} />
      ))}
    </Svg>
  );
}

/**
 * A value over time as a line with its points: the target band shaded, points outside it drawn as
 * red triangles (up for high, down for low) instead of circles, axes with dates and round values, a
 * legend, and one sentence for screen readers. Fills the width it is given.
 */
export function TrendChart({ title, unit, points, band, height = TREND_HEIGHT, testID }: Props) {
  const { palette } = useTheme();
  const [width, setWidth] = useState(0);
  const placed = placePoints(points, band);
  const summary = trendSummary(title, unit, placed, band);
  const onLayout = (e: LayoutChangeEvent) => {
    const w = Math.floor(e.nativeEvent.layout.width);
    if (w > 0 && w !== width) setWidth(w);
  };
  const drawWidth = width || FIRST_WIDTH;
  const hasBand = !!band && (band.min !== null || band.max !== null);

  return (
    <View style={styles.box} testID={testID}>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        {title}
      </ThemedText>
      {placed.length === 0 ? (
        <View style={[styles.empty, { borderColor: palette.border }]} testID={testID ? `${testID}-empty` : undefined}>
          <ThemedText variant="label" weight="regular" tone="textMuted">
            {`No ${title} results logged yet.`}
          </ThemedText>
        </View>
      ) : (
        <>
          <View onLayout={onLayout} style={styles.frame} accessible accessibilityRole="image" accessibilityLabel={summary} testID={testID ? `${testID}-drawing` : undefined}>
            <Drawing placed={placed} band={band} g={trendGeometry(placed, band, drawWidth, height)} width={drawWidth} height={height} yTitle={axisTitle(title, unit)} />
          </View>
          <TrendLegend hasBand={hasBand} />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, alignSelf: 'stretch', minWidth: 0 },
  frame: { alignSelf: 'stretch', overflow: 'hidden' },
  empty: { borderWidth: 1, borderStyle: 'dashed', borderRadius: radius.md, padding: space.lg, alignItems: 'center' },
});
