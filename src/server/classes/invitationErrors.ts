// Plain answers for invitation links that cannot be used. The wording tells the student what to do next.
import { assertNever } from '@shared/assertNever.ts';
import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';
import { problem } from '../http.ts';
import type { AcceptProblem } from './invitation.service.ts';

export function invitationMessage(p: AcceptProblem): string {
  switch (p.kind) {
    case 'forged':
      return 'This invitation link is not valid. Check that you opened the whole link from the e-mail, or ask your teacher to send a new one.';
    case 'expired':
      return `This invitation expired on ${formatDate(p.expiredAt, 'day', WITHOUT_VIEWER)}. Ask your teacher to send a new one.`;
    case 'used':
      return 'This invitation has already been used. If that was you, the class is in your list of classes; otherwise ask your teacher for a new one.';
    case 'revoked':
      return 'Your teacher withdrew this invitation. Ask them for a new one if you still want to join.';
    case 'own-class':
      return 'You teach this class, so you cannot join it as a student.';
    case 'other-account':
      return `This invitation was sent to ${p.invited}, but you are signed in as ${p.signedInAs}. Sign out, then sign in (or create an account) as ${p.invited} to join.`;
    default:
      return assertNever(p);
  }
}

export function invitationProblemResponse(p: AcceptProblem): Response {
  if (p.kind === 'other-account') return problem(409, 'wrong_account', invitationMessage(p));
  const status = p.kind === 'forged' || p.kind === 'own-class' ? 400 : 410;
  return problem(status, p.kind === 'own-class' ? 'invalid_input' : 'invalid_token', invitationMessage(p));
}
