import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { axisTitle } from '@/components/charts/trend-model';
import { newestFirst, sampleDay, shownValue, sideOfValue, sideWord } from '@/components/screens/bath-detail/bath-words';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { quantityLabel, unitOf } from '@/lib/baths/quantities';
import { formatSignificant } from '@/lib/units';
import { type Analysis, type Bath, type Quantity } from '@/shared/baths';

/** Width from which the log is drawn as a grid with a header row; narrower, each analysis is a stacked block (px). */
const GRID_FROM = 640;

type Value = { number: string; side: 'inside' | 'below' | 'above' };

function valueOf(bath: Bath, a: Analysis, q: Quantity): Value | null {
  const v = shownValue(bath, q, a.values[q]);
  if (v === null) return null;
  return { number: formatSignificant(v, 3), side: sideOfValue(bath, q, v) };
}

/** A value with its unit (when asked) and, outside the range, a triangle and the word "low" or "high". */
function ValueText({ value, unit }: { value: Value; unit?: string | null }) {
  const text = unit ? `${value.number} ${unit}` : value.number;
  if (value.side === 'inside') return <>{text}</>;
  return (
    <ThemedText variant="label" weight="bold" tone="danger">
      {`${text} ${value.side === 'above' ? '▲' : '▼'} ${sideWord(value.side)}`}
    </ThemedText>
  );
}

type RowProps = { bath: Bath; a: Analysis; quantities: readonly Quantity[] };

function Block({ bath, a, quantities }: RowProps) {
  const { palette } = useTheme();
  return (
    <View role="listitem" style={[styles.block, { borderTopColor: palette.border }]} testID={`analysis-${a.id}`}>
      <ThemedText variant="label" selectable>{`${sampleDay(a.sampledAt)} · ${a.analyst}`}</ThemedText>
      {quantities.map((q) => {
        const value = valueOf(bath, a, q);
        if (!value) return null;
        return (
          <ThemedText key={q} variant="label" weight="regular" selectable>
            <ThemedText variant="label" weight="regular" tone="textMuted">{`${quantityLabel(q, bath)}: `}</ThemedText>
            <ValueText value={value} unit={unitOf(bath, q)} />
          </ThemedText>
        );
      })}
      {a.notes ? (
        <ThemedText variant="caption" selectable>
          <ThemedText variant="caption" tone="textMuted">Notes: </ThemedText>
          {a.notes}
        </ThemedText>
      ) : null}
    </View>
  );
}

function GridRow({ bath, a, quantities }: RowProps) {
  const { palette } = useTheme();
  return (
    <View role="row" style={[styles.row, styles.body, { borderTopColor: palette.border }]} testID={`analysis-${a.id}`}>
      <ThemedText role="cell" variant="label" weight="regular" style={[styles.cell, styles.date]} selectable>
        {sampleDay(a.sampledAt)}
      </ThemedText>
      <ThemedText role="cell" variant="label" weight="regular" style={[styles.cell, styles.wide]} selectable>
        {a.analyst}
      </ThemedText>
      {quantities.map((q) => {
        const value = valueOf(bath, a, q);
        return (
          <ThemedText key={q} role="cell" variant="label" weight="regular" style={[styles.cell, styles.number]} selectable>
            {value ? <ValueText value={value} /> : '—'}
          </ThemedText>
        );
      })}
      <ThemedText role="cell" variant="caption" style={[styles.cell, styles.notes]} selectable>
        {a.notes}
      </ThemedText>
    </View>
  );
}

function GridHead({ bath, quantities }: { bath: Bath; quantities: readonly Quantity[] }) {
  const head = (label: string, style: object, key: string) => (
    <ThemedText key={key} role="columnheader" variant="caption" weight="semibold" tone="textMuted" style={[styles.cell, style]}>
      {label}
    </ThemedText>
  );
  return (
    <View role="row" style={styles.row}>
      {head('Date', styles.date, 'date')}
      {head('Analyst', styles.wide, 'analyst')}
      {quantities.map((q) => {
        return head(axisTitle(quantityLabel(q, bath), unitOf(bath, q)), styles.number, q);
      })}
      {head('Notes', styles.notes, 'notes')}
    </View>
  );
}

type Props = { bath: Bath; analyses: readonly Analysis[]; quantities: readonly Quantity[] };

/**
 * The analysis log, newest first, values in the bath's units at 3 significant figures. Values outside
 * their target range carry a triangle and the word "low" or "high" as well as the colour. A grid when
 * it has room; stacked blocks on a phone and in the side pane.
 */
export function AnalysesTable({ bath, analyses, quantities }: Props) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.floor(e.nativeEvent.layout.width));
  const rows = newestFirst(analyses);
  if (width >= GRID_FROM) {
    return (
      <View role="table" aria-label="Analyses" testID="analyses-table" onLayout={onLayout}>
        <GridHead bath={bath} quantities={quantities} />
        {rows.map((a) => (
          <GridRow key={a.id} bath={bath} a={a} quantities={quantities} />
        ))}
      </View>
    );
  }
  return (
    <View role="list" aria-label="Analyses" testID="analyses-table" onLayout={onLayout}>
      {rows.map((a) => (
        <Block key={a.id} bath={bath} a={a} quantities={quantities} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xxs },
  row: { flexDirection: 'row', gap: space.sm, paddingVertical: space.xs },
  body: { borderTopWidth: 1, paddingVertical: space.sm },
  cell: { minWidth: 0 },
  date: { flex: 1.2 },
  wide: { flex: 1.2 },
  number: { flex: 1, textAlign: 'right' },
  notes: { flex: 1.6 },
});
