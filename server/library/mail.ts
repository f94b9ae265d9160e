import type { MailMessage } from '@/server/mail/mailer';
import { SIGNATURE } from '@/server/mail/messages';
import { type ConstantSummary, KIND_LABELS } from '@/shared/constants';

/** Tells the proposer what a reviewer decided about their value, with the reviewer's note. */
export function reviewOutcomeMail(input: { to: string; name: string; reviewer: string; summary: ConstantSummary; link: string }): MailMessage {
  const c = input.summary;
  const approved = c.status === 'approved';
  const what = `${KIND_LABELS[c.kind].label} ${c.reaction}, log value ${c.logValue} (version ${c.version})`;
  const effect = approved
    ? c.replacesId !== null
      ? 'It replaces the earlier version, which is now retired; new calculations use this value. Saved runs keep the version they used.'
      : 'New calculations use this value from now on.'
    : 'It stays in the library as a rejected draft; calculations do not use it.';
  return {
    to: input.to,
    subject: `${approved ? 'Approved' : 'Not approved'}: ${c.reaction}`,
    text:
      `Hello ${input.name},\n\n${input.reviewer} has ${approved ? 'approved' : 'rejected'} your proposed constant:\n\n  ${what}\n  Source: ${c.source}\n\n` +
      `Reviewer's note: ${c.reviewNote ?? ''}\n\n${effect}\n\nOpen it in Ligandry:\n${input.link}` +
      SIGNATURE,
  };
}
