import { StyleSheet, View } from 'react-native';

import { reviewLines, SEVERITY_WORDS } from '@/components/hazards/format';
import { GhsPictogramRow } from '@/components/hazards/ghs-pictogram';
import { EvidenceTable, GhsStatements } from '@/components/hazards/hazard-banner';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { formatWhen } from '@/components/ui/format-date';
import { ThemedText } from '@/components/ui/themed-text';
import { DEFER_TO_SDS, type Hazard, type ReviewAction, type ReviewEvent, type ReviewSummary } from '@/shared/safety';

/** What each step of a review is called on paper. */
const ACTION_WORDS: Record<ReviewAction, string> = {
  submitted: 'Submitted',
  signed_off: 'Signed off',
  sent_back: 'Sent back',
  resubmitted: 'Resubmitted',
};

function PrintHazard({ hazard }: { hazard: Hazard }) {
  const { palette } = useTheme();
  return (
    <View role="listitem" style={[styles.item, { borderTopColor: palette.border }]} testID={`print-hazard-${hazard.rule}`}>
      <ThemedText variant="label" weight="bold">
        {`${SEVERITY_WORDS[hazard.severity].toUpperCase()}: ${hazard.step === undefined ? '' : `Step ${hazard.step}: `}${hazard.title}`}
      </ThemedText>
      <ThemedText variant="label" weight="regular">
        {hazard.text}
      </ThemedText>
      <EvidenceTable evidence={hazard.evidence} />
      <GhsStatements ghs={hazard.ghs} reagents={hazard.reagents} />
      <GhsPictogramRow codes={hazard.pictograms} size={32} />
      <ThemedText variant="caption" tone="textMuted">{`Source: ${hazard.source}`}</ThemedText>
    </View>
  );
}

function PrintReview({ review, events }: { review?: ReviewSummary | null; events: readonly ReviewEvent[] }) {
  const lines = review ? reviewLines(review) : null;
  return (
    <View style={styles.block} testID="print-review">
      {lines ? (
        <>
          <ThemedText variant="label">{lines.status}</ThemedText>
          {lines.decided ? <ThemedText variant="label" weight="regular">{lines.decided}</ThemedText> : null}
          {lines.detail ? <ThemedText variant="label" weight="regular">{lines.detail}</ThemedText> : null}
        </>
      ) : null}
      {events.length > 0 ? (
        <View role="list" aria-label="Review history" style={styles.block}>
          {events.map((e, i) => (
            <View key={`${e.action}-${e.at}-${i}`} role="listitem" testID="print-review-event">
              <ThemedText variant="caption" weight="semibold">
                {`${ACTION_WORDS[e.action]} by ${e.actor.name}, ${formatWhen(e.at)}`}
              </ThemedText>
              {e.note ? <ThemedText variant="caption">{e.note}</ThemedText> : null}
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

type Props = {
  hazards: readonly Hazard[];
  /** The safety desk's review of this work, when one was opened. */
  review?: ReviewSummary | null;
  /** The review's history, oldest first. */
  events?: readonly ReviewEvent[];
};

/** Hazards and the desk's review for paper: every fact written out, nothing to press, ending on the SDS line. */
export function HazardSection({ hazards, review, events = [] }: Props) {
  const flagged = hazards.some((h) => h.flag);
  return (
    <View style={styles.section} testID="hazard-section">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Hazards and safety review
      </ThemedText>
      {hazards.length === 0 ? (
        <ThemedText variant="label" weight="regular">
          No hazard rule fired for this work.
        </ThemedText>
      ) : (
        <View role="list" aria-label="Hazards found">
          {hazards.map((h, i) => (
            <PrintHazard key={`${h.rule}-${h.step ?? ''}-${i}`} hazard={h} />
          ))}
        </View>
      )}
      {flagged ? <ThemedText variant="label">Flagged for the safety desk</ThemedText> : null}
      {review || events.length > 0 ? <PrintReview review={review} events={events} /> : null}
      <ThemedText variant="label" weight="semibold">
        {DEFER_TO_SDS}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  item: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xs },
  block: { gap: space.xxs },
});
