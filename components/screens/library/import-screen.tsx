import { StyleSheet, View } from 'react-native';

import { ImportColumns } from '@/components/screens/library/import-columns';
import { ImportForm } from '@/components/screens/library/import-form';
import { ShieldIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextLink } from '@/components/ui/text-link';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';

/** Title of the state shown to people without the chemist role. */
export const NEEDS_CHEMIST = 'Needs the chemist role';

function Body() {
  const { data: me, error, mutate } = useMe();
  const wide = useIsWide();
  if (!me) {
    return error ? <ErrorState message={error.message} onRetry={() => void mutate()} /> : <LoadingState label="Checking your roles…" />;
  }
  if (!hasRole(me, 'chemist')) {
    return (
      <EmptyState
        Icon={ShieldIcon}
        title={NEEDS_CHEMIST}
        body="Importing constants is for chemists: every imported row is a proposal that a reviewer then checks. Ask an admin if you need the role."
      >
        <TextLink href="/library" label="Back to the library" />
      </EmptyState>
    );
  }
  return (
    <View style={wide ? styles.row : styles.stack}>
      <View style={[styles.stack, wide && styles.half]}>
        <ImportForm />
      </View>
      <View style={[styles.stack, wide && styles.half]}>
        <ImportColumns />
      </View>
    </View>
  );
}

/** /library/import: constants from a CSV file become drafts for review (chemists; the server checks the role again). */
export function ImportScreen() {
  return (
    <ScreenContainer
      title="Import constants"
      subtitle="Bring constants in from a CSV file. Every row becomes a draft for review."
      back={{ href: '/library', label: 'Library' }}
    >
      <Body />
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  stack: { gap: space.lg, minWidth: 0 },
  half: { flex: 1 },
});
