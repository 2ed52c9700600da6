/** The mails about a person's own password; the link goes to that person only, never to anyone else. */
export function passwordResetMail(input: {
  name: string;
  workshopName: string;
  resetBy: string;
  url: string;
  hours: number;
}) {
  const subject = `Your Railwright password for ${input.workshopName} was reset`;
  const text = [
    `Hello ${input.name},`,
    '',
    `${input.resetBy} has reset your Railwright password for ${input.workshopName}.`,
    'Your old password no longer works and every place you were signed in has been signed out.',
    '',
    `Choose a new password with this link (it works once, for the next ${input.hours} hours):`,
    input.url,
    '',
    'Nobody else has been sent this link. If you did not expect this, tell the owner of your workshop.',
  ].join('\n');
  return { subject, text };
}

export function passwordChangedMail(input: { name: string; workshopName: string; at: Date }) {
  const subject = `Your Railwright password for ${input.workshopName} was changed`;
  const text = [
    `Hello ${input.name},`,
    '',
    `Your Railwright password for ${input.workshopName} was changed on ${input.at.toISOString().replace('T', ' ').slice(0, 16)} UTC.`,
    'Every session that was signed in before has been signed out.',
    '',
    'If this was not you, tell an admin of your workshop at once and ask for a password reset.',
  ].join('\n');
  return { subject, text };
}

export function passwordForgottenMail(input: { name: string; workshopName: string; url: string; hours: number }) {
  const subject = `Choose a new Railwright password for ${input.workshopName}`;
  const text = [
    `Hello ${input.name},`,
    '',
    `Someone asked for a link to choose a new Railwright password for ${input.workshopName}, for this e-mail address.`,
    '',
    `Choose a new password with this link (it works once, for the next ${input.hours} hours):`,
    input.url,
    '',
    'Your current password keeps working until the link is used. If you did not ask for this, ignore this message.',
  ].join('\n');
  return { subject, text };
}
