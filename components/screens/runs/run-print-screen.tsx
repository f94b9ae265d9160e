import Head from 'expo-router/head';
import { useMemo, type ReactNode } from 'react';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';

import { HazardSection } from '@/components/hazards/hazard-section';
import { RunInputs } from '@/components/screens/calculate/run-inputs';
import { CALCULATOR_LABELS, runStatus, runTitle } from '@/components/screens/calculate/run-words';
import { ModelNotes } from '@/components/screens/runs/model-notes';
import { PrintButton } from '@/components/screens/runs/print-button';
import { PrintCautions } from '@/components/screens/runs/print-cautions';
import { PrintConstants } from '@/components/screens/runs/print-constants';
import { PRINT_CONTROLS_ID, PRINT_PAGE_ID } from '@/components/screens/runs/print-ids';
import { PrintStyles } from '@/components/screens/runs/print-styles';
import { runFormulas } from '@/components/screens/runs/run-cautions';
import { RunResult } from '@/components/screens/runs/run-result';
import { runPath } from '@/components/screens/runs/run-row';
import { RunVerdict } from '@/components/screens/runs/run-verdict';
import { shareUrl } from '@/components/screens/runs/share-link';
import { ThemeContext } from '@/components/theme/theme-provider';
import { palettes, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { isClientError } from '@/lib/api/fetcher';
import { useRun } from '@/lib/api/use-runs';
import { useReview } from '@/lib/api/use-safety';
import { type Run } from '@/shared/constants';

/** Widest the printed column grows, px: 180 mm at 96 px per inch, which fits A4 and Letter inside 15 mm margins. */
const PAGE_WIDTH = 680;

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <ThemedText variant="label" weight="regular">
      <ThemedText variant="label" tone="textMuted">{`${label}: `}</ThemedText>
      {value}
    </ThemedText>
  );
}

/** The full hazard section, with the review's history when this reader may open the review. */
function PrintHazards({ run }: { run: Run }) {
  const review = useReview(run.safety.review?.id ?? null);
  return <HazardSection hazards={run.safety.hazards} review={run.safety.review} events={review.data?.events ?? []} />;
}

function PrintBody({ run }: { run: Run }) {
  const released = run.safety.released;
  return (
    <>
      <View style={styles.block}>
        <ThemedText variant="display" accessibilityRole="header">
          {runTitle(run)}
        </ThemedText>
        <ThemedText variant="body" tone="textMuted">{`Saved run · ${CALCULATOR_LABELS[run.calculator]}`}</ThemedText>
      </View>
      <View style={styles.facts} testID="print-facts">
        <Fact label="Date" value={formatWhen(run.createdAt)} />
        <Fact label="Saved by" value={run.author.name} />
        <Fact label="Bath" value={run.bath ? run.bath.name : 'none named'} />
        <Fact label="Status" value={runStatus(run.status).label} />
        <Fact label="Constants" value={run.usesDrafts ? 'uses drafts that had not been reviewed when it was saved' : 'approved values only'} />
        <Fact label="Engine version" value={run.engineVersion} />
        <Fact label="Release" value={released ? `released by ${released.by.name}, ${formatWhen(released.at)}` : 'not released'} />
      </View>
      <RunVerdict verdict={run.verdict} />
      <PrintHazards run={run} />
      <RunInputs inputs={run.inputs} calculator={run.calculator} />
      <RunResult run={run} print />
      <ModelNotes run={run} />
      <PrintConstants constants={run.constants} />
      <PrintCautions formulas={runFormulas(run)} />
      <ThemedText variant="caption" tone="textMuted" selectable>
        {`Printed from Ligandry. This run: ${shareUrl(run.id)} (team members only).`}
      </ThemedText>
    </>
  );
}

/** The page itself: on the web the document scrolls, so the browser can split it into pages; elsewhere a scroll view. */
function Frame({ children }: { children: ReactNode }) {
  const { palette } = useTheme();
  const column = (
    <View style={styles.column} nativeID={PRINT_PAGE_ID}>
      {children}
    </View>
  );
  if (Platform.OS === 'web') return <View style={[styles.page, { backgroundColor: palette.surface }]}>{column}</View>;
  return (
    <ScrollView style={{ backgroundColor: palette.surface }} contentContainerStyle={styles.page}>
      {column}
    </ScrollView>
  );
}

function PrintPage({ id }: { id: string }) {
  const { data, error, isLoading, mutate } = useRun(id);
  let body;
  if (error) body = <ErrorState message={error.message} onRetry={isClientError(error) ? undefined : () => void mutate()} />;
  else if (isLoading || !data) body = <LoadingState label="Loading the run…" />;
  else body = <PrintBody run={data} />;
  return (
    <Frame>
      <Head>
        <title>{`${data ? runTitle(data) : 'Saved run'} · print · Ligandry`}</title>
      </Head>
      <PrintStyles />
      <View style={styles.controls} nativeID={PRINT_CONTROLS_ID}>
        <TextLink href={runPath(id)} label="‹ Back to the run" accessibilityLabel="Back to the run" />
        {data ? <PrintButton /> : null}
      </View>
      {body}
    </Frame>
  );
}

/** A saved run as a clean page for the browser's print: no navigation, always the light (paper) colours. */
export function RunPrintScreen({ id }: { id: string }) {
  const screen = useTheme();
  const paper = useMemo(() => ({ ...screen, scheme: 'light' as const, palette: palettes.light }), [screen]);
  return (
    <ThemeContext.Provider value={paper}>
      <PrintPage id={id} />
    </ThemeContext.Provider>
  );
}

const styles = StyleSheet.create({
  page: { flexGrow: 1, alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.xl },
  column: { width: '100%', maxWidth: PAGE_WIDTH, gap: space.lg },
  controls: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  block: { gap: space.xs },
  facts: { gap: space.xxs },
});
