/** E-mails are stored and compared trimmed and in lower case, so sign-in ignores how they are typed. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

/**
 * An address as the database compares it (utf8mb4_unicode_ci ignores case, accents and width):
 * compatibility forms folded (full-width letters), accents dropped, lower case. Lookups and attempt
 * limits both use it, so no spelling of one address finds another person or gets an allowance of its own.
 */
export function emailIdentity(email: string): string {
  return email.trim().normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().normalize('NFKC');
}
