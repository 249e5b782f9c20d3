import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@catline/contracts';

/** Enough of an e-mail address to catch a typing slip; the server decides. */
export const emailPattern = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export interface NewPasswordProblems {
  password?: string;
  repeated?: string;
}

/** The server's length rules, checked before sending, and the same password typed twice. */
export function newPasswordProblems(password: string, repeated: string): NewPasswordProblems {
  const problems: NewPasswordProblems = {};
  if (password.length < PASSWORD_MIN_LENGTH) problems.password = `At least ${PASSWORD_MIN_LENGTH} characters; a few words make a good one.`;
  else if (password.length > PASSWORD_MAX_LENGTH) problems.password = `At most ${PASSWORD_MAX_LENGTH} characters.`;
  if (repeated !== password) problems.repeated = 'The two do not match: type the same password twice.';
  return problems;
}

/** The token of a mailed link, which travels after `#token=` so that it never reaches a server log. */
export function tokenFromHash(hash: string): string | null {
  return new URLSearchParams(hash.replace(/^#/, '')).get('token') || null;
}
