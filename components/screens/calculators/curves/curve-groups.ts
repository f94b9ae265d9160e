// A curve's series sorted into charts by what they measure: concentrations (mol/L, log scale by
// default), fractions of a total (0 to 1, linear) and saturation indices (log units, linear).
import { type Curve } from '@/lib/calculators/curves';

import { type AxisScale, type ChartSeries } from './curve-model';

/** One chart: its series and how its y axis is drawn. */
export type ChartGroup = {
  id: 'concentration' | 'fraction' | 'saturation' | 'other';
  title: string;
  unit: string;
  /** The unit as written on the axis title ("mol/L", "0 to 1"). */
  axisUnit: string;
  series: ChartSeries[];
  defaultScale: AxisScale;
  canLog: boolean;
  fixedDomain?: [number, number];
};

const KINDS: Record<string, Omit<ChartGroup, 'series' | 'unit'>> = {
  'mol/L': { id: 'concentration', title: 'Concentrations', axisUnit: 'mol/L', defaultScale: 'log', canLog: true },
  'fraction of total': { id: 'fraction', title: 'Fractions of the total', axisUnit: '0 to 1', defaultScale: 'linear', canLog: false, fixedDomain: [0, 1] },
  'log10 IAP/Ksp': { id: 'saturation', title: 'Saturation index', axisUnit: 'log10 IAP/Ksp', defaultScale: 'linear', canLog: false },
};

/** Whether a stored output looks like a curve (JSON-safe: a value that was not finite is null). */
export function isCurve(output: unknown): output is Curve {
  if (typeof output !== 'object' || output === null) return false;
  const c = output as Partial<Curve>;
  return typeof c.axis === 'object' && Array.isArray(c.series) && Array.isArray(c.points);
}

/** Per point, whether a component's fractions all read 0 (no total to divide: nothing to draw there), by component. */
function emptyTotals(curve: Curve): Map<string, boolean[]> {
  const out = new Map<string, boolean[]>();
  curve.series.forEach((s, i) => {
    const component = /^fraction:(.+):[^:]+$/.exec(s.key)?.[1];
    if (component === undefined) return;
    const now = out.get(component) ?? curve.points.map(() => true);
    curve.points.forEach((p, j) => {
      const v = p.values[i] as number | null | undefined;
      if (typeof v === 'number' && v !== 0) now[j] = false;
    });
    out.set(component, now);
  });
  return out;
}

/** The charts a curve needs, in a fixed order, each with its series' values (null where there is none). */
export function chartGroups(curve: Curve): ChartGroup[] {
  const groups = new Map<string, ChartGroup>();
  const empty = emptyTotals(curve);
  curve.series.forEach((s, i) => {
    const none = empty.get(/^fraction:(.+):[^:]+$/.exec(s.key)?.[1] ?? '');
    const kind = KINDS[s.unit] ?? { id: 'other' as const, title: 'Other values', axisUnit: s.unit, defaultScale: 'linear' as const, canLog: false };
    const group = groups.get(kind.id) ?? { ...kind, unit: s.unit, series: [] };
    const values = curve.points.map((p, j) => {
      const v = p.values[i] as number | null | undefined;
      return typeof v === 'number' && Number.isFinite(v) && !none?.[j] ? v : null;
    });
    group.series.push({ key: s.key, label: s.label, values });
    groups.set(kind.id, group);
  });
  const order = ['concentration', 'fraction', 'saturation', 'other'];
  return [...groups.values()].sort((a, b) => order.indexOf(a.id) - order.indexOf(b.id));
}
