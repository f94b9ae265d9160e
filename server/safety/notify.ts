// Mail from the safety desk, sent after the transaction that made the change has committed. A
// mail that cannot be sent is logged; the change itself stands.
import type { Request } from 'express';

import { type AuthContext, trySend } from '@/server/auth/context';
import { reviewDecisionMail, reviewWaitingMail } from '@/server/safety/mail';
import { personOf, reviewDetail, safetyOfficers } from '@/server/safety/store';
import type { Review } from '@/shared/safety';

/** Where a review's subject opens in the app. */
function subjectPath(review: Review): string {
  return review.subject.kind === 'run' ? `/calculate/runs/${review.subject.id}` : `/baths/${review.subject.id}`;
}

/** Mails every safety officer (but the submitter) that a review waits on the desk. */
export async function mailWaiting(ctx: AuthContext, req: Request, id: string, opts: { resubmitted: boolean; note?: string | null } = { resubmitted: false }): Promise<void> {
  const { review } = await reviewDetail(ctx.db, id);
  const link = `${ctx.publicUrl(req)}/safety/review/${id}`;
  for (const officer of await safetyOfficers(ctx.db)) {
    if (officer.id === review.submittedBy.id) continue;
    await trySend(ctx, reviewWaitingMail({ to: officer.email, name: officer.name, review, link, resubmitted: opts.resubmitted, note: opts.note ?? null }), 'safety review waiting');
  }
}

/** Mails the submitter what the desk decided, with the conditions or the note. */
export async function mailDecision(ctx: AuthContext, req: Request, review: Review): Promise<void> {
  const submitter = await personOf(ctx.db, review.submittedBy.id);
  if (!submitter?.active) return;
  await trySend(ctx, reviewDecisionMail({ to: submitter.email, name: submitter.name, review, link: `${ctx.publicUrl(req)}${subjectPath(review)}` }), 'safety review decision');
}

