import Svg, { Circle, Path } from 'react-native-svg';

type Props = { ring: string; core: string; size?: number };

/** Ligandry's own mark: a central ion held by four bonded ligands, drawn as plain strokes. */
export function BrandMark({ ring, core, size = 28 }: Props) {
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" accessibilityElementsHidden importantForAccessibility="no">
      <Path d="M16 11V6.5M16 21v4.5M11 16H6.5M21 16h4.5" stroke={ring} strokeWidth={2} strokeLinecap="round" />
      <Circle cx={16} cy={4.5} r={2.6} fill="none" stroke={ring} strokeWidth={2} />
      <Circle cx={16} cy={27.5} r={2.6} fill="none" stroke={ring} strokeWidth={2} />
      <Circle cx={4.5} cy={16} r={2.6} fill="none" stroke={ring} strokeWidth={2} />
      <Circle cx={27.5} cy={16} r={2.6} fill="none" stroke={ring} strokeWidth={2} />
      <Circle cx={16} cy={16} r={5} fill={core} />
    </Svg>
  );
}
