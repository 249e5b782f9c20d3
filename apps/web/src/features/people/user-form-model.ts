import {
  type CreateUserRequest,
  NAME_MAX_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  isCatapultRole,
  ROLE_LABELS,
  ROLES,
} from '@catline/contracts';
import * as z from 'zod/mini';
import { emailText, requiredText } from '../../lib/form-rules.js';

/** A new person as typed; the schema hands on the create request with only the fields their role uses. */
export const userSchema = z.pipe(
  z
    .object({
      name: requiredText(NAME_MAX_LENGTH, 'Enter the name.'),
      email: emailText('Enter an e-mail address.'),
      role: z.enum(ROLES),
      // Empty sends an invitation to choose one.
      password: z.string().check(
        z.refine(
          (password) => password === '' || password.length >= PASSWORD_MIN_LENGTH,
          `At least ${PASSWORD_MIN_LENGTH} characters, or leave it empty to send an invitation.`,
        ),
        z.maxLength(PASSWORD_MAX_LENGTH, `At most ${PASSWORD_MAX_LENGTH} characters.`),
      ),
      catapultId: z.string(),
      squadronId: z.string(),
    })
    .check(
      z.superRefine(({ role, catapultId }, context) => {
        if (isCatapultRole(role) && !catapultId)
          context.addIssue({
            code: 'custom',
            path: ['catapultId'],
            message: `A ${ROLE_LABELS[role].toLowerCase()} works one catapult: pick it.`,
          });
      }),
    ),
  z.transform(({ name, email, role, password, catapultId, squadronId }): CreateUserRequest => ({
    name,
    email,
    role,
    password: password === '' ? undefined : password,
    catapultId: isCatapultRole(role) ? Number(catapultId) : undefined,
    squadronId: role === 'pilot' && squadronId ? Number(squadronId) : undefined,
  })),
);

export const blankUser: z.input<typeof userSchema> = {
  name: '',
  email: '',
  role: 'observer',
  password: '',
  catapultId: '',
  squadronId: '',
};
