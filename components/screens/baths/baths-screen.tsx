import { BathIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ScreenContainer } from '@/components/ui/screen-container';

/** Baths section: there are no bath records in this build, and it says so. */
export function BathsScreen() {
  return (
    <ScreenContainer title="Baths" subtitle="Records of the working solutions you keep in service.">
      <EmptyState
        Icon={BathIcon}
        title="No baths recorded yet"
        body="A bath record will hold one solution's process, volume and make-up, the ranges you aim to keep it in, and a log of analyses with the trend they show. Bath records are not available in this build yet."
      />
    </ScreenContainer>
  );
}
