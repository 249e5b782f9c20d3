import { ROLE_LABELS, type Role } from '@catline/contracts';
import type { LinkPurpose } from '../database/entities/password-link.entity.js';

export interface LinkMailInput {
  name: string;
  email: string;
  role: Role;
  link: string;
  lifetimeText: string;
}

/** Where the web app takes a link's token; in the fragment, so it reaches no server log or referrer. */
export const LINK_PATHS: Record<LinkPurpose, string> = {
  invitation: '/invitation',
  reset: '/reset-password',
};

export function invitationMail(input: LinkMailInput): { subject: string; text: string } {
  return {
    subject: 'Your Catline account: choose a password',
    text: [
      `Hello ${input.name},`,
      '',
      `An admin has added you to Catline as ${ROLE_LABELS[input.role].toLowerCase()}; you sign in with ${input.email}.`,
      `Open this link within ${input.lifetimeText} to choose your password:`,
      '',
      input.link,
      '',
      'The link works once. If it has expired, ask an admin to send a new invitation.',
      '',
    ].join('\n'),
  };
}

export function resetMail(input: LinkMailInput): { subject: string; text: string } {
  return {
    subject: 'Catline: set a new password',
    text: [
      `Hello ${input.name},`,
      '',
      `Someone asked to set a new password for the Catline account ${input.email}.`,
      `Open this link within ${input.lifetimeText} to choose it:`,
      '',
      input.link,
      '',
      'The link works once, and setting the password signs you out everywhere.',
      'If you did not ask for this, ignore this mail: your password stays as it is.',
      '',
    ].join('\n'),
  };
}
