import { describe, expect, it } from 'vitest';
import { newPasswordSchema, signInSchema, tokenFromHash } from './auth-model.js';

const problems = (result: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((result.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]));

describe('signing in', () => {
  it('hands on the e-mail without the spaces around it, and the password as typed', () => {
    expect(signInSchema.parse({ email: '  handler@catline.example ', password: ' pass phrase ' })).toEqual({
      email: 'handler@catline.example',
      password: ' pass phrase ',
    });
  });

  it('asks for an address that looks like one, and for a password', () => {
    expect(problems(signInSchema.safeParse({ email: 'handler@catline', password: '' }))).toEqual({
      email: 'Enter your e-mail address, like name@ship.example.',
      password: 'Enter your password.',
    });
  });
});

describe('choosing a new password', () => {
  it('says both what is short and what does not match at once', () => {
    expect(problems(newPasswordSchema.safeParse({ password: 'short', repeated: 'different' }))).toEqual({
      password: 'At least 12 characters; a few words make a good one.',
      repeated: 'The two do not match: type the same password twice.',
    });
  });

  it('takes 12 to 128 characters typed twice the same', () => {
    expect(newPasswordSchema.safeParse({ password: 'x'.repeat(12), repeated: 'x'.repeat(12) }).success).toBe(true);
    expect(newPasswordSchema.safeParse({ password: 'x'.repeat(128), repeated: 'x'.repeat(128) }).success).toBe(true);
    expect(problems(newPasswordSchema.safeParse({ password: 'x'.repeat(129), repeated: 'x'.repeat(129) }))).toEqual({
      password: 'At most 128 characters.',
    });
  });
});

describe('tokenFromHash', () => {
  it('reads the token after #token= and nothing from a hash without one', () => {
    expect(tokenFromHash('#token=Ab_c-9')).toBe('Ab_c-9');
    expect(tokenFromHash('#token=')).toBeNull();
    expect(tokenFromHash('')).toBeNull();
  });
});
