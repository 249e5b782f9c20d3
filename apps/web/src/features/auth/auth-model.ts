import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@catline/contracts';
import * as z from 'zod/mini';
import { emailText } from '../../lib/form-rules.js';

const yourEmail = emailText('Enter your e-mail address, like name@ship.example.');

export const signInSchema = z.object({
  email: yourEmail,
  password: z.string().check(z.minLength(1, 'Enter your password.')),
});

export const passwordLinkSchema = z.object({ email: yourEmail });

/** The server's length rules, checked before sending, and the same password typed twice; both said at once. */
export const newPasswordSchema = z.object({ password: z.string(), repeated: z.string() }).check(
  z.superRefine(({ password, repeated }, context) => {
    if (password.length < PASSWORD_MIN_LENGTH) {
      context.addIssue({
        code: 'custom',
        path: ['password'],
        message: `At least ${PASSWORD_MIN_LENGTH} characters; a few words make a good one.`,
      });
    } else if (password.length > PASSWORD_MAX_LENGTH) {
      context.addIssue({ code: 'custom', path: ['password'], message: `At most ${PASSWORD_MAX_LENGTH} characters.` });
    }
    if (repeated !== password)
      context.addIssue({
        code: 'custom',
        path: ['repeated'],
        message: 'The two do not match: type the same password twice.',
      });
  }),
);

/** The token of a mailed link, which travels after `#token=` so that it never reaches a server log. */
export function tokenFromHash(hash: string): string | null {
  return new URLSearchParams(hash.replace(/^#/, '')).get('token') || null;
}
