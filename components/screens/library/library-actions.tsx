import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { downloadFile } from '@/components/screens/library/download-file';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { keys } from '@/lib/api/keys';
import { useReviewQueue, type ConstantFilter } from '@/lib/api/use-library';
import { hasRole, type User } from '@/shared/auth';

/** The review queue button with the number of drafts waiting (reviewers only). */
function ReviewQueueButton() {
  const router = useRouter();
  const { data } = useReviewQueue(true);
  const n = data?.length;
  return (
    <Button
      label={n === undefined ? 'Review queue' : `Review queue (${n})`}
      accessibilityLabel={n === undefined ? 'Review queue' : `Review queue, ${n} ${n === 1 ? 'draft' : 'drafts'} waiting`}
      onPress={() => router.push('/library/review')}
    />
  );
}

type Props = { me: User | undefined; filter: ConstantFilter };

/** What one can do from the list: propose, import, review (by role), and download the rows shown. */
export function LibraryActions({ me, filter }: Props) {
  const router = useRouter();
  const chemist = hasRole(me, 'chemist');
  return (
    <View style={styles.row}>
      {chemist ? <Button label="Propose a constant" variant="primary" onPress={() => router.push('/library/propose')} /> : null}
      {hasRole(me, 'reviewer') ? <ReviewQueueButton /> : null}
      {chemist ? (
        <Button
          label="Import CSV"
          accessibilityHint="Proposes many constants at once from a CSV file"
          onPress={() => router.push('/library/import')}
        />
      ) : null}
      <Button
        label="Download CSV"
        accessibilityHint="Downloads the constants shown, with the same filters, as a CSV file"
        onPress={() => downloadFile(keys.constantsCsv(filter), 'constants.csv')}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
