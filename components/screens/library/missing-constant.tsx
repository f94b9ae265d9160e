import { LostIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TextLink } from '@/components/ui/text-link';
import { type ApiError } from '@/lib/api/fetcher';

/** A constant that could not be shown: "no such constant" for a bad link or a 404, else the error with Retry. */
export function MissingConstant({ error, onRetry }: { error?: ApiError; onRetry?: () => void }) {
  if (error && error.status !== 404) return <ErrorState message={error.message} onRetry={onRetry} />;
  return (
    <EmptyState Icon={LostIcon} title="No such constant" body="The link may be mistyped, or the version was never saved.">
      <TextLink href="/library" label="Back to the library" />
    </EmptyState>
  );
}
