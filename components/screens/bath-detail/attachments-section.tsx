import { StyleSheet, View } from 'react-native';

import { AttachmentLink } from '@/components/screens/bath-detail/attachment-link';
import { AttachmentUpload } from '@/components/screens/bath-detail/attachment-upload';
import { formatBytes } from '@/components/screens/csv-report/use-csv-upload';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { keys } from '@/lib/api/keys';
import { useAttachments } from '@/lib/api/use-bath-detail';
import { type Attachment } from '@/shared/baths';

const TYPE_WORDS: Record<Attachment['contentType'], string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
};

function AttachmentRow({ item }: { item: Attachment }) {
  const { palette } = useTheme();
  return (
    <View role="listitem" style={[styles.item, { borderTopColor: palette.border }]} testID={`attachment-${item.id}`}>
      <ThemedText variant="label" selectable>
        {item.title}
      </ThemedText>
      <ThemedText variant="caption" selectable>{`${item.fileName} · ${TYPE_WORDS[item.contentType]} · ${formatBytes(item.sizeBytes)}`}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">{`Added by ${item.uploadedBy.name}, ${formatWhen(item.uploadedAt)}`}</ThemedText>
      <AttachmentLink path={keys.attachment(item.bathId, item.id)} fileName={item.fileName} title={item.title} />
    </View>
  );
}

function AttachmentList({ bathId }: { bathId: string }) {
  const { data, error, mutate } = useAttachments(bathId);
  if (!data) {
    return error ? <ErrorState message={error.message} onRetry={() => void mutate()} /> : <LoadingState label="Loading the attachments…" />;
  }
  if (data.length === 0) {
    return (
      <ThemedText variant="label" weight="regular" tone="textMuted">
        No attachments yet.
      </ThemedText>
    );
  }
  return (
    <View role="list" aria-label="Attachments" testID="attachment-list">
      {data.map((item) => (
        <AttachmentRow key={item.id} item={item} />
      ))}
    </View>
  );
}

/** Files kept with the bath (certificates, supplier analyses, photos): the list with downloads, and an upload for writers. */
export function AttachmentsSection({ bathId, canUpload }: { bathId: string; canUpload: boolean }) {
  return (
    <Card style={styles.card} testID="attachments">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Attachments
      </ThemedText>
      <AttachmentList bathId={bathId} />
      {canUpload ? <AttachmentUpload bathId={bathId} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  item: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xxs },
});
