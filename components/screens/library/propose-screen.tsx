import { ConstantForm } from '@/components/screens/library/constant-form';
import { RequireRole } from '@/components/screens/library/require-role';
import { BLANK_FORM, useConstantForm } from '@/components/screens/library/use-constant-form';
import { ScreenContainer } from '@/components/ui/screen-container';
import { useProposeConstant } from '@/lib/api/use-library';
import { proposalSchema } from '@/shared/constants';

function ProposeForm() {
  const { trigger, isMutating } = useProposeConstant();
  const form = useConstantForm({ initial: BLANK_FORM, schema: proposalSchema, send: trigger });
  return <ConstantForm form={form} busy={isMutating} />;
}

/** A new constant, sent as a draft; a reviewer approves it before calculations use it (chemists). */
export function ProposeScreen() {
  return (
    <ScreenContainer
      title="Propose a constant"
      subtitle="It is saved as a draft; a reviewer other than you approves it before any calculation uses it."
      back={{ href: '/library', label: 'Library' }}
    >
      <RequireRole role="chemist" why="Only chemists propose constants. A reviewer or an admin can tell you who to ask.">
        {() => <ProposeForm />}
      </RequireRole>
    </ScreenContainer>
  );
}
