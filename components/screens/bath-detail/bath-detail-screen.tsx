import { useLocalSearchParams } from 'expo-router';

import { AttachmentsSection } from '@/components/screens/bath-detail/attachments-section';
import { canWriteBaths } from '@/components/screens/bath-detail/bath-actions';
import { BathHeader } from '@/components/screens/bath-detail/bath-header';
import { BathLog } from '@/components/screens/bath-detail/bath-log';
import { BathSafety } from '@/components/screens/bath-detail/bath-safety';
import { LogActions } from '@/components/screens/bath-detail/log-actions';
import { LostIcon } from '@/components/shell/icons';
import { useIsWide } from '@/components/theme/use-is-wide';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextLink } from '@/components/ui/text-link';
import { type ApiError } from '@/lib/api/fetcher';
import { useBath } from '@/lib/api/use-baths';
import { useMe } from '@/lib/api/use-me';
import { PROCESS_INFO } from '@/shared/baths';

const BACK = { href: '/baths', label: 'Baths' } as const;

/** The route's `id`, or null when it is missing. */
function useBathId(): string | null {
  const { id } = useLocalSearchParams<{ id?: string }>();
  return typeof id === 'string' && id.trim() !== '' ? id : null;
}

/** A bath that could not be shown: "no such bath" for a bad link or a 404, else the error with Retry. */
function MissingBath({ error, onRetry }: { error?: ApiError; onRetry: () => void }) {
  if (error && error.status !== 404) return <ErrorState message={error.message} onRetry={onRetry} />;
  return (
    <EmptyState Icon={LostIcon} title="No such bath" body="The link may be mistyped, or the bath record was never saved.">
      <TextLink href="/baths" label="Back to the baths" />
    </EmptyState>
  );
}

/** /baths/<id>: one bath's record, trends, analysis log, ways to add to it, and its attachments. */
export function BathDetailScreen() {
  const id = useBathId();
  const { data: bath, error, mutate } = useBath(id);
  const me = useMe().data;
  const wide = useIsWide();

  if (!bath) {
    return (
      <ScreenContainer title="Bath" back={BACK}>
        {id !== null && !error ? <LoadingState label="Loading the bath…" /> : <MissingBath error={error} onRetry={() => void mutate()} />}
      </ScreenContainer>
    );
  }

  const canWrite = canWriteBaths(me);
  const process = PROCESS_INFO[bath.process]?.label ?? bath.process;
  return (
    <ScreenContainer title={bath.name} subtitle={bath.status === 'archived' ? `${process} · archived` : process} back={BACK}>
      <BathHeader bath={bath} me={me} />
      <BathSafety bath={bath} me={me} />
      <BathLog bath={bath} wide={wide} canWrite={canWrite} />
      {canWrite && me ? <LogActions bath={bath} analystName={me.name} /> : null}
      <AttachmentsSection bathId={bath.id} canUpload={canWrite} />
    </ScreenContainer>
  );
}
