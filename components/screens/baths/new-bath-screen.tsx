import { BathForm } from '@/components/screens/baths/bath-form';
import { BLANK_BATH } from '@/components/screens/baths/bath-form-texts';
import { RequireBathRole } from '@/components/screens/baths/require-bath-role';
import { useBathForm } from '@/components/screens/baths/use-bath-form';
import { ScreenContainer } from '@/components/ui/screen-container';
import { useCreateBath } from '@/lib/api/use-baths';

function NewBathForm() {
  const { trigger, isMutating } = useCreateBath();
  const form = useBathForm({ initial: BLANK_BATH, send: trigger });
  return <BathForm form={form} busy={isMutating} saveLabel="Save bath" />;
}

/** A new bath record: process, volume, make-up, units and target ranges (chemists and technicians). */
export function NewBathScreen() {
  return (
    <ScreenContainer
      title="New bath"
      subtitle="One working solution: what it is, how it was made up and the ranges you aim to keep it in."
      back={{ href: '/baths', label: 'Baths' }}
    >
      <RequireBathRole why="Chemists and technicians record baths. An admin can tell you who to ask, or give you the role.">
        {() => <NewBathForm />}
      </RequireBathRole>
    </ScreenContainer>
  );
}
