import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Path, Rect } from 'react-native-svg';

import { palettes, space } from '@/components/theme/tokens';
import { GHS_PICTOGRAMS, type GhsPictogram as GhsCode } from '@/shared/safety';

// The GHS (an open UN standard) fixes a red frame, a black symbol and a white ground whatever the
// page around it looks like, so the colours come from the light palette in both schemes.
const FRAME = palettes.light.danger;
const INK = palettes.light.text;
const GROUND = palettes.light.surface;

// Symbols are our own simple drawings on a 100 × 100 box; the diamond's inner square spans 27–73.
const SYMBOLS: Record<GhsCode, () => ReactNode> = {
  // Flammable: a flame standing on a bar.
  GHS02: () => (
    <>
      <Path d="M50 25c9 11 15 18 13 31-1 8-6 12-13 12s-12-5-12-12c0-7 5-10 6-17 3 4 4 7 3 11 5-4 6-13 3-25z" fill={INK} />
      <Rect x={35} y={71} width={30} height={4} fill={INK} />
    </>
  ),
  // Oxidiser: a flame rising out of a ring.
  GHS03: () => (
    <>
      <Path d="M50 26c6 7 9 12 8 19-1 5-4 7-8 7s-8-3-8-7c0-5 3-7 4-11 2 3 3 5 2 7 3-3 4-8 2-15z" fill={INK} />
      <Circle cx={50} cy={62} r={9} fill="none" stroke={INK} strokeWidth={5} />
      <Rect x={35} y={73} width={30} height={3.5} fill={INK} />
    </>
  ),
  // Gas under pressure: a cylinder lying on its side with its valve.
  GHS04: () => (
    <>
      <Rect x={30} y={48} width={36} height={16} rx={8} fill={INK} />
      <Rect x={66} y={52} width={5} height={8} fill={INK} />
      <Line x1={69} y1={52} x2={69} y2={46} stroke={INK} strokeWidth={3} strokeLinecap="round" />
    </>
  ),
  // Corrosive: two drops falling onto a bar that they eat into.
  GHS05: () => (
    <>
      <Path d="M40 27c4 7 7 11 7 15a7 7 0 0 1-14 0c0-4 3-8 7-15z" fill={INK} />
      <Path d="M60 27c4 7 7 11 7 15a7 7 0 0 1-14 0c0-4 3-8 7-15z" fill={INK} />
      <Path d="M30 60h7a3 3 0 0 0 6 0h14a3 3 0 0 0 6 0h7v10H30z" fill={INK} />
      <Line x1={40} y1={52} x2={40} y2={56} stroke={INK} strokeWidth={2.5} strokeLinecap="round" />
      <Line x1={60} y1={52} x2={60} y2={56} stroke={INK} strokeWidth={2.5} strokeLinecap="round" />
    </>
  ),
  // Acute toxicity: a round skull with two eyes over crossed bones.
  GHS06: () => (
    <>
      <Line x1={35} y1={55} x2={65} y2={72} stroke={INK} strokeWidth={5} strokeLinecap="round" />
      <Line x1={65} y1={55} x2={35} y2={72} stroke={INK} strokeWidth={5} strokeLinecap="round" />
      <Circle cx={50} cy={40} r={12} fill={INK} />
      <Rect x={44} y={46} width={12} height={9} rx={2} fill={INK} />
      <Circle cx={45} cy={40} r={3} fill={GROUND} />
      <Circle cx={55} cy={40} r={3} fill={GROUND} />
    </>
  ),
  // Harmful or irritant: a bold exclamation mark.
  GHS07: () => (
    <>
      <Path d="M45 28h10l-2 30h-6z" fill={INK} />
      <Circle cx={50} cy={66} r={5} fill={INK} />
    </>
  ),
  // Serious health hazard: head and shoulders with a burst on the chest.
  GHS08: () => (
    <>
      <Circle cx={50} cy={35} r={7} fill={INK} />
      <Path d="M33 72c0-15 7-25 17-25s17 10 17 25z" fill={INK} />
      <Path d="M50 52l2.5 6 6 .5-4.5 4 1.5 6-5.5-3.5-5.5 3.5 1.5-6-4.5-4 6-.5z" fill={GROUND} />
    </>
  ),
  // Aquatic environment: a bare tree and a fish above a wave.
  GHS09: () => (
    <>
      <Path d="M37 64V29M37 42l-8-8M37 37l7-8M37 50l8-6" stroke={INK} strokeWidth={4} strokeLinecap="round" fill="none" />
      <Path d="M45 55c6-9 16-9 21 0-5 9-15 9-21 0zM65 55l7-6v12z" fill={INK} />
      <Path d="M29 70c4-3 7-3 10 0s7 3 10 0 7-3 10 0 7 3 10 0" stroke={INK} strokeWidth={3} strokeLinecap="round" fill="none" />
    </>
  ),
};

/** Edge length the pictograms are drawn at unless told, px (legible from 28 to 40). */
export const GHS_PICTOGRAM_SIZE = 36;

type Props = { code: GhsCode; size?: number };

/** One GHS pictogram (red-framed diamond, black symbol on white), named for screen readers by its code and meaning. */
export function GhsPictogram({ code, size = GHS_PICTOGRAM_SIZE }: Props) {
  return (
    <View
      accessible
      accessibilityRole="image"
      accessibilityLabel={`${code}: ${GHS_PICTOGRAMS[code]}`}
      testID={`ghs-${code}`}
      style={{ width: size, height: size }}
    >
      <Svg width={size} height={size} viewBox="0 0 100 100" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
        <Path d="M50 4 96 50 50 96 4 50z" fill={GROUND} stroke={FRAME} strokeWidth={7} strokeLinejoin="round" />
        {SYMBOLS[code]()}
      </Svg>
    </View>
  );
}

/** The pictograms of one hazard in a row; nothing when it has none. */
export function GhsPictogramRow({ codes, size }: { codes: readonly GhsCode[]; size?: number }) {
  if (codes.length === 0) return null;
  return (
    <View style={styles.row}>
      {codes.map((code) => (
        <GhsPictogram key={code} code={code} size={size} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
