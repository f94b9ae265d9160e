import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Text as SvgText } from 'react-native-svg';

import { radius, space, type Palette } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

import { curveGeometry, curveSummary, seriesPath, valueRange, type AxisScale, type ChartSeries, type CurveGeometry } from './curve-model';

/** Height of a curve chart, px; the width follows the column (or is fixed for print). */
export const CURVE_HEIGHT = 260;
const FIRST_WIDTH = 320;

/** Line colours by palette role and dash patterns: colour and dash together tell up to 18 series apart. */
const INKS: readonly (keyof Palette)[] = ['primary', 'accent', 'ok', 'caution', 'danger', 'text'];
const DASHES = [undefined, '7 4', '2 3'] as const;

/** The ink and dash of series `i`. */
export function seriesStyle(palette: Palette, i: number): { stroke: string; dash: string | undefined } {
  return { stroke: palette[INKS[i % INKS.length] as keyof Palette], dash: DASHES[Math.floor(i / INKS.length) % DASHES.length] };
}

type Props = {
  /** What the chart shows ("Concentrations"); the heading and the start of its summary. */
  title: string;
  xTitle: string;
  yTitle: string;
  xs: readonly number[];
  /** Per point: drawn (settled) or left out. */
  keep: readonly boolean[];
  series: readonly ChartSeries[];
  xScale: AxisScale;
  yScale: AxisScale;
  /** A fixed y domain (fractions: 0..1); default: the values. */
  yDomain?: [number, number];
  /** Fixed width for print, px; default: the width of the column. */
  width?: number;
  testID?: string;
};

function Axes({ g, xTitle, height }: { g: CurveGeometry; xTitle: string; height: number }) {
  const { palette, typeface } = useTheme();
  const font = { fontFamily: typeface('regular').fontFamily, fontSize: 11, fill: palette.textMuted };
  return (
    <G>
      {g.yTicks.ticks.map((v, i) => (
        <G key={`y${i}`}>
          <Line x1={g.left} x2={g.right} y1={g.y(v)} y2={g.y(v)} stroke={palette.border} strokeWidth={0.75} />
          <SvgText {...font} x={g.left - 6} y={g.y(v) + 4} textAnchor="end">
            {g.yTicks.labels[i]}
          </SvgText>
        </G>
      ))}
      {g.xTicks.ticks.map((v, i) => (
        <G key={`x${i}`}>
          <Line x1={g.x(v)} x2={g.x(v)} y1={g.bottom} y2={g.bottom + 4} stroke={palette.textMuted} />
          <SvgText {...font} x={g.x(v)} y={g.bottom + 16} textAnchor={i === 0 ? 'start' : i === g.xTicks.ticks.length - 1 ? 'end' : 'middle'}>
            {g.xTicks.labels[i]}
          </SvgText>
        </G>
      ))}
      <Line x1={g.left} x2={g.left} y1={g.top} y2={g.bottom} stroke={palette.textMuted} />
      <Line x1={g.left} x2={g.right} y1={g.bottom} y2={g.bottom} stroke={palette.textMuted} />
      <SvgText {...font} fill={palette.text} x={(g.left + g.right) / 2} y={height - 6} textAnchor="middle">
        {xTitle}
      </SvgText>
    </G>
  );
}

/** Legend: each series' line sample and name; wraps on a phone. */
function Legend({ series }: { series: readonly ChartSeries[] }) {
  const { palette } = useTheme();
  return (
    <View style={styles.legend} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {series.map((s, i) => {
        const ink = seriesStyle(palette, i);
        return (
          <View key={s.key} style={styles.item}>
            <Svg width={26} height={10} aria-hidden>
              <Line x1={1} x2={25} y1={5} y2={5} stroke={ink.stroke} strokeWidth={2.5} strokeDasharray={ink.dash} />
            </Svg>
            <ThemedText variant="caption">{s.label}</ThemedText>
          </View>
        );
      })}
    </View>
  );
}

/** Several series against one swept input: axes with ticks and titles, linear or log on either axis, gaps where a point did not settle, a legend and a one-sentence summary for screen readers. */
export function CurveChart({ title, xTitle, yTitle, xs, keep, series, xScale, yScale, yDomain, width, testID }: Props) {
  const { palette } = useTheme();
  const [measured, setMeasured] = useState(0);
  // A print width is an upper bound: on a narrow screen the chart still fits its column.
  const drawWidth = width ? Math.min(width, measured || width) : measured || FIRST_WIDTH;
  const range = yDomain ?? valueRange(series, yScale, keep);
  const onLayout = (e: LayoutChangeEvent) => {
    const w = Math.floor(e.nativeEvent.layout.width);
    if (w > 0 && w !== measured) setMeasured(w);
  };
  const summary = curveSummary(title, xTitle, xs, series, keep);
  return (
    <View style={styles.box} testID={testID}>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        {yTitle}
      </ThemedText>
      {range === null || xs.length < 2 ? (
        <View style={[styles.empty, { borderColor: palette.border }]}>
          <ThemedText variant="label" weight="regular" tone="textMuted">
            {yScale === 'log' ? 'Nothing above 0 to draw on a log scale.' : 'No value to draw.'}
          </ThemedText>
        </View>
      ) : (
        <View onLayout={onLayout} style={width ? { width, maxWidth: '100%' } : styles.frame} accessible accessibilityRole="image" accessibilityLabel={summary} testID={testID ? `${testID}-drawing` : undefined}>
          <Drawing {...{ xs, keep, series, xScale, yScale, xTitle }} width={drawWidth} range={range} />
        </View>
      )}
      <Legend series={series} />
    </View>
  );
}

type DrawingProps = Pick<Props, 'xs' | 'keep' | 'series' | 'xScale' | 'yScale' | 'xTitle'> & { width: number; range: [number, number] };

function Drawing({ xs, keep, series, xScale, yScale, xTitle, width, range }: DrawingProps) {
  const { palette } = useTheme();
  const g = curveGeometry({ xs, xScale, yScale, width, height: CURVE_HEIGHT, yDomain: range });
  return (
    <Svg width={width} height={CURVE_HEIGHT} aria-hidden>
      <Axes g={g} xTitle={xTitle} height={CURVE_HEIGHT} />
      {series.map((s, i) => {
        const ink = seriesStyle(palette, i);
        const d = seriesPath(xs, s.values, keep, g, xScale, yScale);
        return d ? <Path key={s.key} d={d} stroke={ink.stroke} strokeWidth={2} strokeDasharray={ink.dash} strokeLinecap="round" fill="none" /> : null;
      })}
    </Svg>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, alignSelf: 'stretch', minWidth: 0 },
  frame: { alignSelf: 'stretch', overflow: 'hidden' },
  empty: { borderWidth: 1, borderStyle: 'dashed', borderRadius: radius.md, padding: space.lg, alignItems: 'center' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs, maxWidth: '100%' },
});
