import { BooksIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ScreenContainer } from '@/components/ui/screen-container';

/** Library section: no constants are loaded yet; explains what will be kept here. */
export function LibraryScreen() {
  return (
    <ScreenContainer title="Library" subtitle="The equilibrium constants every calculation will draw on.">
      <EmptyState
        Icon={BooksIcon}
        title="No constants yet"
        body="The library will hold reviewed solubility products (Ksp), formation constants and protonation constants, each with its source and a version history, so any result can be traced back to the numbers behind it. None are loaded in this build."
      />
    </ScreenContainer>
  );
}
