import type { MailMessage } from '@/server/mail/mailer';
import { SIGNATURE } from '@/server/mail/messages';
import { type Review, DEFER_TO_SDS } from '@/shared/safety';

function subjectText(review: Review): string {
  return review.subject.kind === 'run' ? `the run "${review.subject.title || 'Untitled run'}"` : `the bath "${review.subject.title}"`;
}

function hazardLines(review: Review): string {
  return review.hazards
    .filter((h) => h.flag)
    .map((h) => `  - ${h.title}${h.step !== undefined ? ` (step ${h.step})` : ''}`)
    .join('\n');
}

/** To each safety officer: work is waiting on the desk (new, or resubmitted with a note). */
export function reviewWaitingMail(input: { to: string; name: string; review: Review; link: string; resubmitted: boolean; note?: string | null }): MailMessage {
  const r = input.review;
  const what = subjectText(r);
  return {
    to: input.to,
    subject: `${input.resubmitted ? 'Resubmitted' : 'For review'}: ${r.subject.title || 'Untitled run'}`,
    text:
      `Hello ${input.name},\n\n${r.submittedBy.name} ${input.resubmitted ? 'has resubmitted' : 'has saved'} ${what}, which the hazard rules flagged:\n\n${hazardLines(r)}\n\n` +
      (input.note ? `Their note: ${input.note}\n\n` : '') +
      `Please review the evidence and sign it off (with any conditions) or send it back:\n${input.link}` +
      SIGNATURE,
  };
}

/** To the submitter: the desk signed off (with conditions) or sent the work back (with a note). */
export function reviewDecisionMail(input: { to: string; name: string; review: Review; link: string }): MailMessage {
  const r = input.review;
  const signed = r.status === 'signed_off';
  const decider = r.decidedBy?.name ?? 'A safety officer';
  const body = signed
    ? `${decider} has signed off ${subjectText(r)}.\n\nConditions: ${r.conditions?.trim() ? r.conditions : 'none given'}\n\n` +
      (r.subject.kind === 'run' ? 'The run can now be released. Keep to the conditions while the work goes ahead.' : 'Keep to the conditions while the bath is worked.')
    : `${decider} has sent back ${subjectText(r)}.\n\nTheir note: ${r.note ?? ''}\n\nChange what the note asks for, then resubmit it from the run or bath in Ligandry.`;
  return {
    to: input.to,
    subject: `${signed ? 'Signed off' : 'Sent back'}: ${r.subject.title || 'Untitled run'}`,
    text: `Hello ${input.name},\n\n${body}\n\n${DEFER_TO_SDS}\n\nOpen it in Ligandry:\n${input.link}` + SIGNATURE,
  };
}
