import { useEffect, useRef } from 'react';

import { parseAmount, type SystemForm } from '@/components/screens/calculate/use-system-form';
import { useBuildSystem } from '@/lib/api/use-system';
import { type BuiltSystem } from '@/shared/constants';

import { selectionOf } from './run';

/** Wait after the last change of ions before asking the library, ms. */
const PREVIEW_DEBOUNCE_MS = 400;

/** A built system and the selection (ions, drafts, pH) it was built for. */
export type BuiltFor = { key: string; built: BuiltSystem };

/** The selection key of the form as it stands (ions, drafts and a readable pH), and the request for it. */
export function formSelection(form: SystemForm) {
  const pH = parseAmount(form.pH);
  const request = selectionOf({ ...form.groups, includeDrafts: form.includeDrafts, ...(pH !== undefined && pH >= -2 && pH <= 16 ? { pH } : {}) });
  return { key: JSON.stringify(request), request };
}

/**
 * Builds the chosen ions from the library as soon as they are picked (totals not needed), so a
 * calculator can offer the solids, species and components there are before the first Calculate.
 * `onBuilt` gets each preview; failures are left for Calculate to report beside the fields.
 */
export function usePreviewBuild(form: SystemForm, onBuilt: (b: BuiltFor) => void) {
  const preview = useBuildSystem();
  const { key, request } = formSelection(form);
  const asked = useRef<string | null>(null);
  const report = useRef(onBuilt);
  report.current = onBuilt;
  const { trigger } = preview;
  const hasMetal = request.metals.length > 0;

  useEffect(() => {
    if (!hasMetal || asked.current === key) return;
    const timer = setTimeout(() => {
      asked.current = key;
      trigger(JSON.parse(key))
        .then((built) => {
          if (asked.current === key) report.current({ key, built });
        })
        .catch(() => {
          // NOTE: a preview that fails says nothing; Calculate asks again and shows the reason beside the field.
          if (asked.current === key) asked.current = null;
        });
    }, PREVIEW_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [key, hasMetal, trigger]);
}
