import { PASSWORD_MIN_LENGTH } from '@shared/passwords';

export const NEW_PASSWORD_HINT = `At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong password that is easy to type; very common passwords are refused.`;
