import Svg, { Circle, Path, Rect } from 'react-native-svg';

/** Where a point lies against the target range; out-of-range points get a triangle pointing the way they left it. */
export type MarkKind = 'inside' | 'below' | 'above';

/** The SVG path of a triangle centred on x, y: pointing up for "above", down for "below" (`r` = half the width). */
export function trianglePath(x: number, y: number, r: number, side: 'below' | 'above'): string {
  const h = r * 1.8;
  const tip = side === 'above' ? y - h / 2 - 1 : y + h / 2 + 1;
  const base = side === 'above' ? y + h / 2 - 1 : y - h / 2 + 1;
  return `M${x} ${tip}L${x + r} ${base}L${x - r} ${base}Z`;
}

type MarkProps = { x: number; y: number; kind: MarkKind; ink: string; outInk: string; halo: string; size?: number };

/** One data point: a filled circle inside the range, a triangle in another colour outside it (shape and colour both). */
export function PointMark({ x, y, kind, ink, outInk, halo, size = 4 }: MarkProps) {
  if (kind === 'inside') return <Circle cx={x} cy={y} r={size} fill={ink} stroke={halo} strokeWidth={1.5} />;
  return <Path d={trianglePath(x, y, size + 2, kind)} fill={outInk} stroke={halo} strokeWidth={1.5} />;
}

type SwatchProps = { ink: string; outInk: string; halo: string };

/** Legend swatch for the target band: a soft box with dashed edges. */
export function BandSwatch({ fill, edge }: { fill: string; edge: string }) {
  return (
    <Svg width={22} height={14} aria-hidden>
      <Rect x={1} y={2} width={20} height={10} fill={fill} stroke={edge} strokeWidth={1} strokeDasharray="3 2" />
    </Svg>
  );
}

/** Legend swatch for a point inside the range. */
export function InsideSwatch({ ink, halo }: Omit<SwatchProps, 'outInk'>) {
  return (
    <Svg width={14} height={14} aria-hidden>
      <PointMark x={7} y={7} kind="inside" ink={ink} outInk={ink} halo={halo} />
    </Svg>
  );
}

/** Legend swatch for points outside the range: the up (high) and down (low) triangles. */
export function OutsideSwatch({ outInk, halo }: Omit<SwatchProps, 'ink'>) {
  return (
    <Svg width={30} height={16} aria-hidden>
      <PointMark x={8} y={8} kind="above" ink={outInk} outInk={outInk} halo={halo} />
      <PointMark x={22} y={8} kind="below" ink={outInk} outInk={outInk} halo={halo} />
    </Svg>
  );
}
