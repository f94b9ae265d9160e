import { ConstantForm } from '@/components/screens/library/constant-form';
import { MissingConstant } from '@/components/screens/library/missing-constant';
import { RequireRole } from '@/components/screens/library/require-role';
import { textsFrom, useConstantForm } from '@/components/screens/library/use-constant-form';
import { useIdParam } from '@/components/screens/library/use-id-param';
import { constantHref, STATUS_WORDS, valueText } from '@/components/screens/library/words';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { ScreenContainer } from '@/components/ui/screen-container';
import { useConstant, useReviseConstant } from '@/lib/api/use-library';
import { revisionSchema, type ConstantSummary } from '@/shared/constants';

function ReviseForm({ base }: { base: ConstantSummary }) {
  const { trigger, isMutating } = useReviseConstant(base.id);
  const form = useConstantForm({ initial: textsFrom(base), schema: revisionSchema, send: trigger });
  return (
    <>
      <Notice
        kind="info"
        message={`Revising version ${base.version} (${STATUS_WORDS[base.status].label.toLowerCase()}, ${valueText(base)}). The revision is a new draft; version ${base.version} stays as it is until a reviewer approves the revision.`}
      />
      <ConstantForm form={form} base={base} busy={isMutating} />
    </>
  );
}

function Loaded({ id }: { id: number | null }) {
  const { data, error, isLoading, mutate } = useConstant(id);
  if (id === null) return <MissingConstant />;
  if (error) return <MissingConstant error={error} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading the version to revise…" />;
  return <ReviseForm key={data.constant.id} base={data.constant} />;
}

/** A revision of one version: same reaction and kind, new values and a note on what changed (chemists). */
export function ReviseScreen() {
  const id = useIdParam();
  return (
    <ScreenContainer
      title="Propose a revision"
      subtitle="Edits never overwrite: the revision is a new version that a reviewer approves or rejects."
      back={id === null ? { href: '/library', label: 'Library' } : { href: constantHref(id), label: 'The constant' }}
    >
      <RequireRole role="chemist" why="Only chemists propose revisions. A reviewer or an admin can tell you who to ask.">
        {() => <Loaded id={id} />}
      </RequireRole>
    </ScreenContainer>
  );
}
