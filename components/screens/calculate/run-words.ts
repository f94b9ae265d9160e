import { type StatusKind } from '@/components/ui/status-dot';
import { CALCULATOR_LABELS as LABELS } from '@/shared/calculators';
import { type RunSummary } from '@/shared/constants';

/** Plain names of the calculators a run can come from. */
export const CALCULATOR_LABELS: Record<RunSummary['calculator'], string> = Object.fromEntries(
  Object.entries(LABELS).map(([k, v]) => [k, v.label]),
) as Record<RunSummary['calculator'], string>;

/** A run's solver status in words and colour. */
export function runStatus(status: RunSummary['status']): { label: string; kind: StatusKind } {
  return status === 'converged' ? { label: 'Settled', kind: 'ok' } : { label: 'Did not settle', kind: 'bad' };
}

/** The title to show: the run's own, or a stand-in when it was saved without one. */
export function runTitle(run: Pick<RunSummary, 'title'>): string {
  return run.title.trim() === '' ? 'Untitled run' : run.title;
}
