import { useLocalSearchParams } from 'expo-router';

import { BathForm } from '@/components/screens/baths/bath-form';
import { textsFrom } from '@/components/screens/baths/bath-form-texts';
import { bathHref } from '@/components/screens/baths/bath-words';
import { RequireBathRole } from '@/components/screens/baths/require-bath-role';
import { useBathForm } from '@/components/screens/baths/use-bath-form';
import { BathIcon, LostIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextLink } from '@/components/ui/text-link';
import { useBath, useUpdateBath } from '@/lib/api/use-baths';
import { type Bath } from '@/shared/baths';

function EditBathForm({ bath }: { bath: Bath }) {
  const { trigger, isMutating } = useUpdateBath(bath.id);
  const form = useBathForm({ initial: textsFrom(bath), send: trigger });
  return <BathForm form={form} busy={isMutating} saveLabel="Save changes" />;
}

/** The server refuses changes to an archived bath, so the form is not offered. */
function Archived({ bath }: { bath: Bath }) {
  return (
    <EmptyState Icon={BathIcon} title="This bath is archived" body="An archived bath is kept as it was. An admin can restore it from the bath's page; then it can be edited.">
      <TextLink href={bathHref(bath.id)} label="Back to the bath" />
    </EmptyState>
  );
}

function Loaded({ id }: { id: string | null }) {
  const { data, error, isLoading, mutate } = useBath(id);
  if (id === null || error?.status === 404) {
    return (
      <EmptyState Icon={LostIcon} title="No such bath" body="The link may be mistyped, or the bath was never saved.">
        <TextLink href="/baths" label="Back to the baths" />
      </EmptyState>
    );
  }
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading the bath…" />;
  if (data.status === 'archived') return <Archived bath={data} />;
  return <EditBathForm key={data.id} bath={data} />;
}

/** The bath form filled with a saved bath; saving sends the changes (chemists and technicians). */
export function EditBathScreen() {
  const { id } = useLocalSearchParams<{ id?: string }>();
  const bathId = typeof id === 'string' && id.trim() !== '' ? id : null;
  return (
    <ScreenContainer
      title="Edit bath"
      subtitle="The bath's record: process, volume, make-up, units and target ranges."
      back={bathId === null ? { href: '/baths', label: 'Baths' } : { href: bathHref(bathId), label: 'The bath' }}
    >
      <RequireBathRole why="Chemists and technicians change bath records. An admin can tell you who to ask, or give you the role.">
        {() => <Loaded id={bathId} />}
      </RequireBathRole>
    </ScreenContainer>
  );
}
