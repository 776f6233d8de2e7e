import type { Expectations } from './types.js';

export const CSV_EXPECTATIONS: Expectations = {};
