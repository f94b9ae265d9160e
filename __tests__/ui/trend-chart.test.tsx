import { fireEvent, render, screen } from '@testing-library/react-native';
import { Circle, Path, Rect, Text as SvgText } from 'react-native-svg';

import { dateTicks, DAY_MS, monthDay, niceTicks, yearSpan } from '@/components/charts/scale';
import { TrendChart } from '@/components/charts/trend-chart';
import { placePoints, trendGeometry, trendSummary } from '@/components/charts/trend-model';

/** The words drawn inside the SVG (axis titles and tick labels), which are not host Text. */
function drawnTexts(): string[] {
  return screen.UNSAFE_getAllByType(SvgText).map((n) => String(n.props.children));
}

const day = (iso: string) => Date.parse(`${iso}T00:00:00Z`);

describe('niceTicks', () => {
  const cases: { name: string; lo: number; hi: number; ticks: number[] }[] = [
    { name: 'free cyanide around its 90–130 g/L range', lo: 84.2, hi: 131, ticks: [80, 100, 120, 140] },
    { name: 'pH 11.4 to 12.6', lo: 11.4, hi: 12.6, ticks: [11, 11.5, 12, 12.5, 13] },
    { name: 'small metal values in troy oz/gal', lo: 0.31, hi: 0.38, ticks: [0.3, 0.32, 0.34, 0.36, 0.38] },
    { name: 'one flat value', lo: 30, hi: 30, ticks: [26, 28, 30, 32, 34] },
    { name: 'zero alone', lo: 0, hi: 0, ticks: [-1, -0.5, 0, 0.5, 1] },
  ];
  it.each(cases)('$name', ({ lo, hi, ticks }) => {
    const t = niceTicks(lo, hi);
    expect(t.ticks.length).toBeGreaterThanOrEqual(3);
    expect(t.ticks.length).toBeLessThanOrEqual(6);
    expect(t.min).toBeLessThanOrEqual(Math.min(lo, hi));
    expect(t.max).toBeGreaterThanOrEqual(Math.max(lo, hi));
    expect(t.ticks).toEqual(ticks);
  });

  it('keeps 3 to 6 ticks over many spans and never prints float noise', () => {
    for (const [lo, hi] of [[0.1, 0.3], [1, 1000], [-5, 5], [12.05, 12.15], [0.000123, 0.000456], [99999, 100001]] as const) {
      const t = niceTicks(lo, hi);
      expect(t.ticks.length).toBeGreaterThanOrEqual(3);
      expect(t.ticks.length).toBeLessThanOrEqual(6);
      for (const v of t.ticks) expect(String(v).length).toBeLessThan(12);
    }
  });
});

describe('date axis', () => {
  it('writes short month-day labels in UTC and names the years', () => {
    expect(monthDay(day('2026-03-04'))).toBe('Mar 4');
    expect(yearSpan(day('2026-01-02'), day('2026-12-30'))).toBe('2026');
    expect(yearSpan(day('2025-11-02'), day('2026-02-01'))).toBe('2025–2026');
  });

  it('steps by days, weeks or months to stay within the room', () => {
    expect(dateTicks(day('2026-03-01'), day('2026-03-04'), 6).map(monthDay)).toEqual(['Mar 1', 'Mar 2', 'Mar 3', 'Mar 4']);
    const weeks = dateTicks(day('2026-03-01'), day('2026-04-10'), 6);
    expect(weeks.length).toBeLessThanOrEqual(6);
    expect(weeks[1]! - weeks[0]!).toBe(7 * DAY_MS);
    const months = dateTicks(day('2025-06-15'), day('2026-05-20'), 5);
    expect(months.length).toBeLessThanOrEqual(5);
    for (const t of months) expect(new Date(t).getUTCDate()).toBe(1);
  });
});

describe('trend model', () => {
  const band = { min: 90, max: 130 };
  const points = [
    { at: '2026-03-03', value: 120 },
    { at: '2026-03-01', value: 85 },
    { at: '2026-03-05', value: 140 },
    { at: '2026-03-07', value: 28.1 },
  ];

  it('orders points by time and marks each side of the band', () => {
    const placed = placePoints(points, band);
    expect(placed.map((p) => p.value)).toEqual([85, 120, 140, 28.1]);
    expect(placed.map((p) => p.kind)).toEqual(['below', 'inside', 'above', 'below']);
  });

  it('sums the chart up in one sentence', () => {
    expect(trendSummary('Free KCN', 'g/L', placePoints(points, band), band)).toBe(
      'Free KCN over 4 analyses, 3 outside the target range; latest 28.1 g/L (low)',
    );
    expect(trendSummary('pH', null, placePoints([{ at: '2026-03-01', value: 12.1 }], null), null)).toBe(
      'pH over 1 analysis, no target range set; latest 12.1',
    );
  });

  it('stretches the value axis over an open band end and the points', () => {
    const g = trendGeometry(placePoints([{ at: '2026-03-01', value: 10 }], { min: null, max: 40 }), { min: null, max: 40 }, 360, 220);
    expect(g.yTicks.min).toBeLessThanOrEqual(10);
    expect(g.yTicks.max).toBeGreaterThanOrEqual(40);
    expect(g.right).toBeLessThanOrEqual(360);
  });
});

describe('TrendChart', () => {
  const points = Array.from({ length: 16 }, (_, i) => ({ at: day('2026-02-01') + i * 2 * DAY_MS, value: i === 3 ? 85 : i === 9 ? 150 : 100 + i }));
  points.push({ at: day('2026-03-10'), value: 28.1 });

  it('reads as one sentence, with a legend and a y-axis title with the unit', () => {
    render(<TrendChart title="Free KCN" unit="g/L" points={points.slice(1)} band={{ min: 90, max: 130 }} testID="chart" />);
    expect(screen.getByRole('header', { name: 'Free KCN' })).toBeOnTheScreen();
    expect(screen.getByLabelText('Free KCN over 16 analyses, 3 outside the target range; latest 28.1 g/L (low)')).toBeOnTheScreen();
    expect(drawnTexts()).toContain('Free KCN (g/L)');
    expect(screen.getByText('target range')).toBeOnTheScreen();
    expect(screen.getByText('in range')).toBeOnTheScreen();
    expect(screen.getByText(/^out of range/)).toBeOnTheScreen();
    expect(drawnTexts()).toContain('Date sampled, 2026');
    expect(drawnTexts().filter((t) => /^(Feb|Mar) \d+$/.test(t)).length).toBeGreaterThanOrEqual(2);
    const yLabels = drawnTexts().filter((t) => /^\d+$/.test(t));
    expect(yLabels.length).toBeGreaterThanOrEqual(3);
    expect(yLabels.length).toBeLessThanOrEqual(6);
  });

  it('draws points outside the band as triangles, inside ones as circles', () => {
    render(<TrendChart title="Free KCN" unit="g/L" points={points} band={{ min: 90, max: 130 }} testID="chart" />);
    // 14 inside points are circles; the legend adds one more circle.
    expect(screen.UNSAFE_getAllByType(Circle)).toHaveLength(14 + 1);
    const triangles = screen.UNSAFE_getAllByType(Path).filter((p) => /Z$/.test(String(p.props.d)));
    // 3 points outside, plus the legend's two triangles.
    expect(triangles).toHaveLength(3 + 2);
    expect(screen.UNSAFE_getAllByType(Rect).length).toBeGreaterThanOrEqual(1);
  });

  it('fills the width it is laid out in', () => {
    const { UNSAFE_root } = render(<TrendChart title="Ag metal" unit="g/L" points={points} band={{ min: 28, max: null }} testID="chart" />);
    fireEvent(screen.getByTestId('chart-drawing'), 'layout', { nativeEvent: { layout: { width: 612, height: 220 } } });
    const svgs = UNSAFE_root.findAll((n) => n.props.width === 612 && n.props.height === 220);
    expect(svgs.length).toBeGreaterThan(0);
  });

  it('without a band, says so and has no range legend', () => {
    render(<TrendChart title="Carbonate" unit="g/L" points={points.slice(0, 3)} testID="chart" />);
    expect(screen.getByLabelText(/Carbonate over 3 analyses, no target range set; latest/)).toBeOnTheScreen();
    expect(screen.getByText('result (no target range set)')).toBeOnTheScreen();
    expect(screen.queryByText('target range')).toBeNull();
  });

  it('shows an empty state when there is nothing to draw', () => {
    render(<TrendChart title="pH" unit={null} points={[]} band={{ min: 11.5, max: 12.5 }} testID="chart" />);
    expect(screen.getByText('No pH results logged yet.')).toBeOnTheScreen();
    expect(screen.queryByTestId('chart-drawing')).toBeNull();
  });
});
