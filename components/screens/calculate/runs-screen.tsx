import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { CALCULATOR_LABELS, runStatus, runTitle } from '@/components/screens/calculate/run-words';
import { FlaskIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { StatusPill } from '@/components/ui/status-dot';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { useRuns } from '@/lib/api/use-runs';
import { type RunSummary } from '@/shared/constants';

function RunRow({ run }: { run: RunSummary }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const status = runStatus(run.status);
  const title = runTitle(run);
  const byline = `${CALCULATOR_LABELS[run.calculator]} · ${run.author.name} · ${formatWhen(run.createdAt)}`;
  return (
    <Link href={`/calculate/runs/${encodeURIComponent(run.id)}`} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={title}
        accessibilityHint={`${byline}. ${status.label}${run.usesDrafts ? '. Uses drafts' : ''}`}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        testID={`run-${run.id}`}
        style={StyleSheet.flatten<ViewStyle>([
          styles.row,
          { borderColor: palette.border, backgroundColor: palette.surfaceRaised },
          focus.ring(palette.primary),
        ])}
      >
        <View style={styles.words}>
          <ThemedText variant="label" tone="primary">
            {title}
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            {byline}
          </ThemedText>
          <View style={styles.pills}>
            <StatusPill kind={status.kind} label={status.label} />
            {run.usesDrafts ? <StatusPill kind="warn" label="Uses drafts" /> : null}
          </View>
        </View>
        <ThemedText variant="title" tone="primary" aria-hidden>
          ›
        </ThemedText>
      </Pressable>
    </Link>
  );
}

/** Saved runs, newest first, each opening its stored inputs, result and constant versions. */
export function RunsScreen() {
  const { data, error, isLoading, mutate } = useRuns();
  let body;
  if (error) body = <ErrorState message={error.message} onRetry={() => void mutate()} />;
  else if (isLoading || !data) body = <LoadingState label="Loading saved runs…" />;
  else if (data.length === 0) {
    body = (
      <EmptyState Icon={FlaskIcon} title="No saved runs yet" body="Work out a speciation and press Save run: it is kept here with the constant versions it used.">
        <TextLink href="/calculate/system" label="Open speciation" />
      </EmptyState>
    );
  } else {
    const newestFirst = [...data].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
    body = (
      <View style={styles.list} role="list" aria-label="Saved runs">
        {newestFirst.map((run) => (
          <RunRow key={run.id} run={run} />
        ))}
      </View>
    );
  }
  return (
    <ScreenContainer title="Saved runs" subtitle="Every saved calculation, newest first." back={{ href: '/calculate', label: 'Calculate' }}>
      {body}
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 1,
  },
  words: { flex: 1, gap: space.xxs, minWidth: 0 },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
