import { ROLE_WORDS } from './role-words.js';
import type { Role } from '../database/schema/users.js';

/** The sign-in mail for a new member: who invited them, their role, and the link. */
export function invitationMail(input: {
  name: string;
  role: Role;
  workshopName: string;
  invitedBy: string;
  url: string;
  hours: number;
}) {
  const subject = `Your Railwright sign-in for ${input.workshopName}`;
  const text = [
    `Hello ${input.name},`,
    '',
    `${input.invitedBy} has added you to ${input.workshopName} on Railwright as ${ROLE_WORDS[input.role]}.`,
    '',
    'Choose your password with this link (it works once, for the next ' + `${input.hours} hours):`,
    input.url,
    '',
    'Then sign in with this e-mail address and that password.',
    'If you did not expect this message you can ignore it.',
  ].join('\n');
  return { subject, text };
}
