import { dictionary } from '@zxcvbn-ts/language-common';
import { passwordProblem } from '../../../shared/src/passwords.js';
import { ValidationError } from '../errors.js';

let common: Set<string> | null = null;

/** True when the password is on the list of about 49,000 most common passwords (case-insensitive). */
export function isCommonPassword(password: string): boolean {
  common ??= new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));
  return common.has(password.toLowerCase());
}

/** Throws a 400 on the password field when the password is too short, too simple or too common. */
export function assertAcceptablePassword(password: string, field = 'password'): void {
  const problem = passwordProblem(password);
  if (problem) throw new ValidationError(problem, field, 'weak_password');
  if (isCommonPassword(password)) {
    throw new ValidationError('This password is one of the most common ones. Choose another.', field, 'weak_password');
  }
}
