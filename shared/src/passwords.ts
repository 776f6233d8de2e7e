/** Password rules shared by the forms and the server. The server also refuses common passwords. */
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 256;

/** A sentence saying what is wrong with a new password, or null when it is acceptable here. */
export function passwordProblem(password: string): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters`;
  if (new Set(password).size < 4) return 'Use more than three different characters';
  return null;
}
