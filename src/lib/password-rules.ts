// Password length rules. Source: NIST SP 800-63B-4 (Digital Identity Guidelines, 2025),
// §3.1.1.2: at least 15 characters when the password is the only factor; accept at least 64.
export const passwordMinLength = 15;
export const passwordMaxLength = 64;
/** bcrypt reads at most 72 bytes of its input; longer passwords would be silently cut. */
export const passwordMaxBytes = 72;

export function passwordProblem(password: string): string | null {
  if (password.length < passwordMinLength) {
    return `Use at least ${passwordMinLength} characters (a few words with spaces are easy to remember).`;
  }
  if (password.length > passwordMaxLength || new TextEncoder().encode(password).length > passwordMaxBytes) {
    return `Use at most ${passwordMaxLength} characters.`;
  }
  return null;
}
