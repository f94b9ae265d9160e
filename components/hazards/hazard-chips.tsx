import { StyleSheet, View } from 'react-native';

import { SEVERITY_WORDS } from '@/components/hazards/format';
import { CautionIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import {
  HAZARD_RULES,
  type Hazard,
  type HazardRule,
  type HazardSeverity,
  type ReviewStatus,
  type ReviewSummary,
} from '@/shared/safety';

/** A few words per rule, short enough for a chip in a list row. */
export const HAZARD_SHORT_LABELS: Record<HazardRule, string> = {
  cyanide_present: 'Cyanide',
  cyanide_low_ph: 'Low pH cyanide',
  acid_into_cyanide: 'Acid + cyanide',
  ammoniacal_silver: 'Ammoniacal silver',
  acidified_thiosulfate: 'Acid fixer (SO2)',
  ammonia_vapour: 'Ammonia vapour',
};

/** The desk's standing in a chip's few words ("Desk: waiting"). */
const DESK_WORDS: Record<ReviewStatus, string> = { pending: 'waiting', signed_off: 'signed off', sent_back: 'sent back' };

/** One chip per rule that fired, at the worst severity it fired with: dangers first, then in rule order. */
function chipsFor(hazards: readonly Pick<Hazard, 'rule' | 'severity'>[]): { rule: HazardRule; severity: HazardSeverity }[] {
  const worst = new Map<HazardRule, HazardSeverity>();
  for (const h of hazards) if (worst.get(h.rule) !== 'danger') worst.set(h.rule, h.severity);
  const rank = (s: HazardSeverity) => (s === 'danger' ? 0 : 1);
  return [...worst]
    .map(([rule, severity]) => ({ rule, severity }))
    .sort((a, b) => rank(a.severity) - rank(b.severity) || HAZARD_RULES.indexOf(a.rule) - HAZARD_RULES.indexOf(b.rule));
}

function RuleChip({ rule, severity }: { rule: HazardRule; severity: HazardSeverity }) {
  const { palette } = useTheme();
  const danger = severity === 'danger';
  const ink = danger ? palette.danger : palette.caution;
  const label = HAZARD_SHORT_LABELS[rule];
  return (
    <View
      accessible
      accessibilityLabel={`${SEVERITY_WORDS[severity]}: ${label}`}
      testID={`hazard-chip-${rule}`}
      style={[styles.chip, { backgroundColor: danger ? palette.dangerSoft : palette.cautionSoft, borderColor: ink }]}
    >
      {/* Shape as well as colour: only danger chips carry the warning triangle. */}
      {danger ? <CautionIcon color={ink} size={14} /> : null}
      <ThemedText variant="caption" weight="semibold" tone={danger ? 'danger' : 'caution'}>
        {label}
      </ThemedText>
    </View>
  );
}

function DeskChip({ status }: { status: ReviewStatus }) {
  const { palette } = useTheme();
  const look = {
    pending: { soft: palette.cautionSoft, tone: 'caution' as const },
    signed_off: { soft: palette.okSoft, tone: 'ok' as const },
    sent_back: { soft: palette.dangerSoft, tone: 'danger' as const },
  }[status];
  return (
    <View
      accessible
      accessibilityLabel={`Safety desk: ${DESK_WORDS[status]}`}
      testID="hazard-chip-desk"
      style={[styles.chip, styles.desk, { backgroundColor: look.soft, borderColor: palette[look.tone] }]}
    >
      <ThemedText variant="caption" weight="semibold" tone={look.tone}>
        {`Desk: ${DESK_WORDS[status]}`}
      </ThemedText>
    </View>
  );
}

type Props = {
  /** Full hazards or the briefs lists carry: only the rule and severity are read. */
  hazards: readonly Pick<Hazard, 'rule' | 'severity'>[];
  /** The safety desk's review, shown as one more chip when there is one. */
  review?: Pick<ReviewSummary, 'status'> | null;
};

/** Small tags for a list row: one per hazard rule that fired, and the desk's standing; nothing when there is neither. */
export function HazardChips({ hazards, review }: Props) {
  const chips = chipsFor(hazards);
  if (chips.length === 0 && !review) return null;
  return (
    <View style={styles.row} testID="hazard-chips">
      {chips.map((c) => (
        <RuleChip key={c.rule} rule={c.rule} severity={c.severity} />
      ))}
      {review ? <DeskChip status={review.status} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xxs,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    borderRadius: radius.pill,
    borderWidth: 1.5,
  },
  desk: { borderStyle: 'dashed' },
});
