import type { Role } from '@understudy/shared-types';
import { INVITATION_LIFETIME_HOURS, PASSWORD_RESET_LIFETIME_MINUTES, ROLE_LABELS } from '@understudy/shared-types';
import type { OutgoingMail } from './mailer';

export function invitationMail(input: { to: string; role: Role; inviterName: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'You are invited to Understudy',
    text: [
      `${input.inviterName} has invited you to Understudy as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      '',
      'Open this link to choose your name and password:',
      input.link,
      '',
      `The link works once and expires in ${INVITATION_LIFETIME_HOURS} hours.`,
      'If you did not expect this, you can ignore this message.',
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Understudy password',
    text: [
      `Hello ${input.name},`,
      '',
      'Someone asked to reset the password of your Understudy account. Open this link to choose a new one:',
      input.link,
      '',
      `The link works once and expires in ${PASSWORD_RESET_LIFETIME_MINUTES} minutes.`,
      'If you did not ask for this, ignore this message; your password stays as it is.',
    ].join('\n'),
  };
}
