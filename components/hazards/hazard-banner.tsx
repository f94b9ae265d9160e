import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { formatEvidenceValue, ghsLine, reviewLines, SEVERITY_WORDS, worstSeverity } from '@/components/hazards/format';
import { GhsPictogramRow } from '@/components/hazards/ghs-pictogram';
import { CautionIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { type Evidence, type GhsStatement, type Hazard, type ReviewSummary } from '@/shared/safety';

/** The numbers that made a rule fire, as label and value in two columns, each note beneath its row. */
export function EvidenceTable({ evidence }: { evidence: readonly Evidence[] }) {
  if (evidence.length === 0) return null;
  return (
    <View role="table" aria-label="Evidence" style={styles.table}>
      {evidence.map((e, i) => (
        <View key={`${e.label}-${i}`} role="row" style={styles.row}>
          <ThemedText role="cell" variant="caption" tone="textMuted" style={styles.cell}>
            {e.label}
          </ThemedText>
          <View role="cell" style={styles.cell}>
            <ThemedText variant="caption" weight="semibold">
              {formatEvidenceValue(e.value, e.unit)}
            </ThemedText>
            {e.note ? (
              <ThemedText variant="caption" tone="textMuted">
                {e.note}
              </ThemedText>
            ) : null}
          </View>
        </View>
      ))}
    </View>
  );
}

/** GHS hazard statements, one per line with its code, under the reagents they belong to. */
export function GhsStatements({ ghs, reagents }: { ghs: readonly GhsStatement[]; reagents: readonly string[] }) {
  if (ghs.length === 0) return null;
  return (
    <View style={styles.ghs}>
      {reagents.length > 0 ? (
        <ThemedText variant="caption" tone="textMuted">{`GHS statements for ${reagents.join(', ')}`}</ThemedText>
      ) : null}
      {ghs.map((g) => (
        <ThemedText key={g.code} variant="caption" weight="semibold">
          {ghsLine(g)}
        </ThemedText>
      ))}
    </View>
  );
}

function HazardBlock({ hazard, detailed }: { hazard: Hazard; detailed: boolean }) {
  const { palette } = useTheme();
  const danger = hazard.severity === 'danger';
  const word = SEVERITY_WORDS[hazard.severity];
  return (
    <View
      role="listitem"
      testID={`hazard-${hazard.rule}`}
      style={[styles.block, { backgroundColor: palette.surface, borderLeftColor: danger ? palette.danger : palette.caution }]}
    >
      <ThemedText variant="label" weight="bold">
        <ThemedText variant="label" weight="bold" tone={danger ? 'danger' : 'caution'}>{`${word}: `}</ThemedText>
        {hazard.step === undefined ? hazard.title : `Step ${hazard.step}: ${hazard.title}`}
      </ThemedText>
      {detailed ? (
        <>
          <ThemedText variant="label" weight="regular">
            {hazard.text}
          </ThemedText>
          <EvidenceTable evidence={hazard.evidence} />
          <GhsStatements ghs={hazard.ghs} reagents={hazard.reagents} />
          <GhsPictogramRow codes={hazard.pictograms} />
        </>
      ) : null}
    </View>
  );
}

function DeskNote({ flagged, review, detailed }: { flagged: boolean; review?: ReviewSummary | null; detailed: boolean }) {
  if (!flagged && !review) return null;
  const lines = review ? reviewLines(review) : null;
  return (
    <View style={styles.desk}>
      {flagged ? (
        <ThemedText variant="label" testID="hazard-flag-note">
          Flagged for the safety desk
        </ThemedText>
      ) : null}
      {lines ? <ThemedText variant="label" weight="regular">{lines.status}</ThemedText> : null}
      {lines?.detail && detailed ? <ThemedText variant="label" weight="regular">{lines.detail}</ThemedText> : null}
      {lines?.decided && detailed ? (
        <ThemedText variant="caption" tone="textMuted">
          {lines.decided}
        </ThemedText>
      ) : null}
    </View>
  );
}

function DetailsToggle({ open, onToggle }: { open: boolean; onToggle: () => void }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ expanded: open }}
      aria-expanded={open}
      onPress={onToggle}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={[styles.toggle, focus.ring(palette.primary)]}
    >
      <ThemedText variant="label" tone="primary">
        {open ? 'Hide details' : 'Show details'}
      </ThemedText>
    </Pressable>
  );
}

type Props = {
  hazards: readonly Hazard[];
  /** The safety desk's review of this work, when one was opened. */
  review?: ReviewSummary | null;
  /** Titles only, with a toggle for the rest (narrow screens, lists). */
  compact?: boolean;
};

/** The hazards of a result or run, worst first in the headline; nothing at all when no rule fired. */
export function HazardBanner({ hazards, review, compact = false }: Props) {
  const { palette } = useTheme();
  const [open, setOpen] = useState(false);
  const worst = worstSeverity(hazards);
  if (worst === null) return null;
  const strong = worst === 'danger' ? palette.danger : palette.caution;
  const detailed = !compact || open;
  const count = hazards.length === 1 ? '1 hazard' : `${hazards.length} hazards`;
  return (
    <View
      role="region"
      aria-label="Hazards"
      accessibilityLabel="Hazards"
      testID="hazard-banner"
      style={[styles.banner, { backgroundColor: worst === 'danger' ? palette.dangerSoft : palette.cautionSoft, borderColor: strong }]}
    >
      <View style={styles.head}>
        <CautionIcon color={strong} size={22} />
        <ThemedText variant="body" weight="bold" tone={worst} accessibilityRole="header">
          {`${SEVERITY_WORDS[worst]} · ${count}`}
        </ThemedText>
      </View>
      <View role="list" aria-label="Hazards found" style={styles.list}>
        {hazards.map((h, i) => (
          <HazardBlock key={`${h.rule}-${h.step ?? ''}-${i}`} hazard={h} detailed={detailed} />
        ))}
      </View>
      <DeskNote flagged={hazards.some((h) => h.flag)} review={review} detailed={detailed} />
      {compact ? <DetailsToggle open={open} onToggle={() => setOpen((o) => !o)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { gap: space.md, padding: space.lg, borderRadius: radius.md, borderWidth: 1, borderLeftWidth: 5 },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  list: { gap: space.sm },
  block: { gap: space.xs, padding: space.md, borderRadius: radius.sm, borderLeftWidth: 3 },
  table: { gap: space.xxs },
  row: { flexDirection: 'row', gap: space.md },
  cell: { flex: 1 },
  ghs: { gap: space.xxs },
  desk: { gap: space.xxs },
  toggle: { alignSelf: 'flex-start', minHeight: 36, justifyContent: 'center', borderRadius: radius.sm },
});
