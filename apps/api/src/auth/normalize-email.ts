/** E-mails are stored and compared trimmed and in lower case, so sign-in ignores how they are typed. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}
