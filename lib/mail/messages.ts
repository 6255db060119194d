import { ROLE_LABELS, type Role } from '../roles';
import { appLink } from './links';
import type { OutgoingMail } from './outbox';

// The words of every account mail, in one place. Plain text: it reads the same in any client.
const SIGN_OFF =
  '\n\n— Runnel\nIf you did not expect this message, you can ignore it; nothing changes until the link is used.';

export function signUpMail(to: string, name: string, token: string): OutgoingMail {
  const link = appLink('/confirm-email', { token });
  return {
    kind: 'sign-up',
    to,
    subject: 'Confirm your e-mail address for Runnel',
    text: `Hello ${name},\n\nConfirm this address to finish creating your Runnel account:\n${link}\n\nThe link works once, for 24 hours.${SIGN_OFF}`,
  };
}

/** Sent instead of a confirmation when the address already has an account (the sign-up answer is the same). */
export function alreadyRegisteredMail(to: string): OutgoingMail {
  return {
    kind: 'sign-up-existing',
    to,
    subject: 'You already have a Runnel account',
    text: `Someone asked to create a Runnel account for this address, which already has one.\n\nSign in: ${appLink('/sign-in')}\nForgot the password? Reset it: ${appLink('/reset-password')}${SIGN_OFF}`,
  };
}

export function passwordResetMail(to: string, token: string): OutgoingMail {
  const link = appLink('/reset-password/choose', { token });
  return {
    kind: 'password-reset',
    to,
    subject: 'Reset your Runnel password',
    text: `Choose a new password for your Runnel account here:\n${link}\n\nThe link works once, for one hour. Every device signed in to the account will be signed out.${SIGN_OFF}`,
  };
}

export function invitationMail(
  to: string,
  teamName: string,
  inviterName: string,
  role: Role,
  token: string,
): OutgoingMail {
  const link = appLink('/invitations/accept', { token });
  return {
    kind: 'invitation',
    to,
    subject: `${inviterName} invites you to ${teamName} on Runnel`,
    text: `${inviterName} invites you to join the team “${teamName}” on Runnel as ${ROLE_LABELS[role]}.\n\nAccept the invitation:\n${link}\n\nThe link works once, for 7 days.${SIGN_OFF}`,
  };
}
