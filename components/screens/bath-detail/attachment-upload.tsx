import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useAttachmentPicker, type PickedAttachment } from '@/components/screens/bath-detail/attachment-picker';
import { formatBytes } from '@/components/screens/csv-report/use-csv-upload';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { ApiError } from '@/lib/api/fetcher';
import { errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { attachmentFormData, useUploadAttachment } from '@/lib/api/use-bath-detail';
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES } from '@/shared/baths';

/** Longest title the form takes (characters). */
const TITLE_MAX = 200;

const BY_EXTENSION: Record<string, (typeof ATTACHMENT_TYPES)[number]> = { pdf: 'application/pdf', png: 'image/png', jpg: 'image/jpeg', jpeg: 'image/jpeg' };

/** The file's type: as the chooser reported it, else from the name's ending; null when unknown. */
export function attachmentType(file: Pick<PickedAttachment, 'name' | 'type'>): string | null {
  if (file.type) return file.type;
  const ext = /\.([A-Za-z0-9]+)$/.exec(file.name)?.[1]?.toLowerCase();
  return ext ? (BY_EXTENSION[ext] ?? null) : null;
}

/** Why a file cannot be attached (type or size), or null when it can; the server checks again. */
export function attachmentProblem(file: PickedAttachment): string | null {
  const type = attachmentType(file);
  if (!type || !(ATTACHMENT_TYPES as readonly string[]).includes(type)) {
    return `${file.name} is not a PDF, PNG or JPEG file. Attach a PDF (a certificate, a report) or a PNG or JPEG picture.`;
  }
  if (file.size !== null && file.size > ATTACHMENT_MAX_BYTES) {
    return `${file.name} is ${formatBytes(file.size)}; the largest file you can attach is ${formatBytes(ATTACHMENT_MAX_BYTES)}. Save it smaller or split it.`;
  }
  return null;
}

/** Server refusals in words, when the server sent no message of its own. */
function uploadErrors(error: unknown): FormErrors {
  if (error instanceof ApiError && error.code === 'http_error') {
    if (error.status === 413) return { fields: {}, form: `The file is too large: the largest file you can attach is ${formatBytes(ATTACHMENT_MAX_BYTES)}.` };
    if (error.status === 415) return { fields: {}, form: 'The server takes only PDF, PNG and JPEG files.' };
  }
  return errorsFromApi(error, ['title', 'file']);
}

/** Attach a PDF, PNG or JPEG to the bath with a title (chemists, technicians). */
export function AttachmentUpload({ bathId }: { bathId: string }) {
  const pick = useAttachmentPicker();
  const { trigger, isMutating } = useUploadAttachment(bathId);
  const [file, setFile] = useState<PickedAttachment | null>(null);
  const [title, setTitle] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [done, setDone] = useState<string | null>(null);
  const problem = file ? attachmentProblem(file) : null;

  const choose = async () => {
    setErrors(NO_ERRORS);
    setDone(null);
    try {
      const picked = await pick();
      if (!picked) return;
      setFile(picked);
      // The file's name without its ending is a fair first title.
      if (!title.trim()) setTitle(picked.name.replace(/\.[A-Za-z0-9]+$/, ''));
    } catch (cause) {
      setErrors({ fields: {}, form: cause instanceof Error ? cause.message : 'The file could not be opened.' });
    }
  };

  const upload = async () => {
    if (!file || problem || isMutating) return;
    const trimmed = title.trim();
    if (!trimmed) return setErrors({ fields: { title: 'Enter a title' } });
    setErrors(NO_ERRORS);
    setDone(null);
    try {
      const saved = await trigger(attachmentFormData(file.part, file.name, trimmed));
      setDone(`Attached “${saved.title}”.`);
      setFile(null);
      setTitle('');
    } catch (error) {
      setErrors(uploadErrors(error));
    }
  };

  return (
    <View style={styles.stack} testID="attachment-upload">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Attach a file
      </ThemedText>
      {done ? <Notice kind="success" message={done} /> : null}
      <Button label={file ? 'Choose another file' : 'Choose a PDF, PNG or JPEG'} onPress={() => void choose()} disabled={isMutating} />
      {file ? (
        <ThemedText variant="label" weight="regular" testID="attachment-picked-file" selectable>
          {`${file.name} · ${file.size === null ? 'size unknown' : formatBytes(file.size)}`}
        </ThemedText>
      ) : (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          {`No file chosen yet. PDF, PNG or JPEG, at most ${formatBytes(ATTACHMENT_MAX_BYTES)}.`}
        </ThemedText>
      )}
      {problem ? <Notice kind="error" message={problem} /> : null}
      <TextField label="Title" value={title} onChangeText={setTitle} onSubmit={() => void upload()} autoCapitalize="sentences" maxLength={TITLE_MAX} hint="What the file is, e.g. Supplier analysis, March" error={errors.fields.title ?? errors.fields.file} />
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      <Button label="Upload the file" busyLabel="Uploading…" busy={isMutating} disabled={!file || !!problem} variant="primary" accessibilityHint="Attaches the file to this bath" onPress={() => void upload()} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
