import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { CalculatorFrame } from '@/components/screens/calculators/calculator-frame';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';

import { FIXER_SOLIDS, fixerCsv, fixerVerdict, isFixerResult } from './fixer-words';

type FixerSolid = (typeof FIXER_SOLIDS)[number]['solid'];

const FIELDS = ['solid', 'silver'] as const;
const SILVER = 'Ag+';

function FieldError({ message }: { message?: string }) {
  return message ? (
    <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
      {message}
    </ThemedText>
  ) : null;
}

function FixerFields({ ctx, solid, onSolid }: { ctx: ParamsSlotContext; solid: FixerSolid; onSolid: (s: FixerSolid) => void }) {
  const choice = FIXER_SOLIDS.find((s) => s.solid === solid) ?? FIXER_SOLIDS[0];
  const { form } = ctx;
  const missing = [!form.groups.metals.includes(SILVER) ? { group: 'metals' as const, formula: SILVER } : null, !form.groups.ligands.includes(choice.halide) ? { group: 'ligands' as const, formula: choice.halide } : null].filter((m) => m !== null);
  return (
    <View style={styles.fields}>
      <View style={styles.group}>
        <ChoiceChips<FixerSolid>
          label="Silver halide the fixer dissolves"
          options={FIXER_SOLIDS.map((s) => ({ value: s.solid, label: s.solid, hint: s.name }))}
          value={solid}
          onChange={onSolid}
          disabled={ctx.disabled}
        />
        <FieldError message={ctx.errors.solid} />
      </View>
      <View style={styles.group}>
        <ThemedText variant="label" weight="regular">{`Silver counted as ${SILVER}.`}</ThemedText>
        <FieldError message={ctx.errors.silver} />
      </View>
      {missing.length > 0 ? (
        <View style={styles.group}>
          <CautionNote message={`${choice.solid} needs ${missing.map((m) => m.formula).join(' and ')} in the solution (a total of 0 is fine for the halide).`} />
          <Button
            label={`Add ${missing.map((m) => m.formula).join(' and ')}`}
            accessibilityLabel={`Add ${missing.map((m) => m.formula).join(' and ')} to the solution`}
            disabled={ctx.disabled}
            onPress={() => missing.forEach((m) => form.toggle(m.group, m.formula))}
          />
        </View>
      ) : null}
    </View>
  );
}

/** /calculate/fixer-loading: how much silver a thiosulfate fixer holds, how much more it takes as a silver halide, and the loading. */
export function FixerLoadingScreen() {
  const [solid, setSolid] = useState<FixerSolid>('AgBr(s)');
  return (
    <CalculatorFrame
      calculator="fixer_loading"
      paramFields={FIELDS}
      params={{ ok: true, params: { solid, silver: SILVER } }}
      renderParams={(ctx) => <FixerFields ctx={ctx} solid={solid} onSolid={setSolid} />}
      verdict={(run) => (isFixerResult(run.result) ? fixerVerdict(run.result, run.verdict) : run.verdict)}
      csv={(output) => (isFixerResult(output) ? fixerCsv(output) : null)}
      emptyHint="For thiosulfate fixers: choose Ag+, S2O3-2 and the halide, enter the totals (or start from a fixer bath), then press Calculate."
    />
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.xs },
});
