import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { DecideDraft, RetireVersion } from '@/components/screens/library/decision-forms';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { hasRole, type User } from '@/shared/auth';
import { type ConstantSummary } from '@/shared/constants';

/** Message shown to a reviewer looking at their own draft (the server refuses it with 403 too). */
export const OWN_DRAFT = 'You proposed this version, so another reviewer has to approve or reject it.';

type Props = { c: ConstantSummary; me: User | undefined; isLatest: boolean };

/** What the signed-in person may do with this version: revise (chemists), decide or retire (reviewers). */
export function ConstantActions({ c, me, isLatest }: Props) {
  const router = useRouter();
  const [done, setDone] = useState<string | null>(null);
  const reviewer = hasRole(me, 'reviewer');
  const canRevise = hasRole(me, 'chemist') && (c.status === 'approved' || isLatest);
  const own = !!me && c.proposedBy?.id === me.id;
  const decide = reviewer && c.status === 'draft';
  const retire = reviewer && c.status === 'approved';
  if (!canRevise && !decide && !retire && !done) return null;

  return (
    <Card style={styles.card} testID="constant-actions">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        {decide ? 'Decision' : 'Actions'}
      </ThemedText>
      {done ? <Notice kind="success" message={done} /> : null}
      {decide ? (
        own ? (
          <Notice kind="info" message={OWN_DRAFT} />
        ) : (
          <DecideDraft c={c} onDone={setDone} />
        )
      ) : null}
      {canRevise ? (
        <Button
          label="Propose a revision"
          accessibilityHint="Opens a form prefilled with this version; the revision waits for review"
          onPress={() => router.push(`/library/revise/${c.id}`)}
        />
      ) : null}
      {retire ? <RetireVersion c={c} onDone={setDone} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
});
