import type { OutgoingMail } from './mailer';

const SIGNATURE = '\n\n— Claybank\nShared consolidation parameters. Preliminary assessment only.';

export function verificationMail(to: string, name: string, url: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail address for Claybank',
    text: `Hello ${name},\n\nOpen this link to confirm your e-mail address and finish signing up:\n\n${url}\n\nThe link works for 24 hours. If you did not sign up, ignore this message.${SIGNATURE}`,
  };
}

export function existingAccountMail(to: string, name: string, signInUrl: string, resetUrl: string): OutgoingMail {
  return {
    to,
    subject: 'Someone tried to sign up to Claybank with your address',
    text: `Hello ${name},\n\nSomeone (perhaps you) tried to create a Claybank account with this e-mail address, which already has one.\n\nSign in: ${signInUrl}\nForgot your password? ${resetUrl}\n\nIf it was not you, nothing has changed and you can ignore this message.${SIGNATURE}`,
  };
}

export function passwordResetMail(to: string, name: string, url: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Claybank password',
    text: `Hello ${name},\n\nOpen this link to choose a new password:\n\n${url}\n\nThe link works for one hour. Resetting signs you out everywhere. If you did not ask for this, ignore this message.${SIGNATURE}`,
  };
}

export function invitationMail(to: string, inviterName: string, firmName: string, roleLabel: string, url: string): OutgoingMail {
  return {
    to,
    subject: `${inviterName} invited you to ${firmName} on Claybank`,
    text: `Hello,\n\n${inviterName} invited you to join ${firmName} on Claybank as ${roleLabel}.\n\nOpen this link to accept (sign up first with this e-mail address if you have no account):\n\n${url}\n\nThe invitation expires in 7 days.${SIGNATURE}`,
  };
}
