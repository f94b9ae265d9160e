import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** The states a status indicator can show; each has its own colour and its own words. */
export type StatusKind = 'ok' | 'warn' | 'bad' | 'unknown';

type DotProps = { kind: StatusKind; size?: number; onRail?: boolean };

/** A small filled circle; always paired with text by callers, never the only signal. */
export function StatusDot({ kind, size = 10, onRail = false }: DotProps) {
  const { palette } = useTheme();
  const color = onRail
    ? { ok: palette.railOk, warn: palette.railCaution, bad: palette.railDanger, unknown: palette.onRailMuted }[kind]
    : { ok: palette.ok, warn: palette.caution, bad: palette.danger, unknown: palette.textMuted }[kind];
  return <View style={[styles.dot, { width: size, height: size, backgroundColor: color }]} />;
}

type PillProps = { kind: StatusKind; label: string };

/** A rounded tag with a dot and a word, for states shown inline on cards. */
export function StatusPill({ kind, label }: PillProps) {
  const { palette } = useTheme();
  const soft = { ok: palette.okSoft, warn: palette.cautionSoft, bad: palette.dangerSoft, unknown: palette.surfaceRaised }[
    kind
  ];
  const tone = ({ ok: 'ok', warn: 'caution', bad: 'danger', unknown: 'textMuted' } as const)[kind];
  return (
    <View style={[styles.pill, { backgroundColor: soft, borderColor: palette.border }]}>
      <StatusDot kind={kind} size={8} />
      <ThemedText variant="caption" weight="semibold" tone={tone}>
        {label}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  dot: { borderRadius: radius.pill },
  pill: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs + space.xxs,
    paddingHorizontal: space.sm + space.xxs,
    paddingVertical: space.xxs,
    borderRadius: radius.pill,
    borderWidth: StyleSheet.hairlineWidth * 2,
  },
});
