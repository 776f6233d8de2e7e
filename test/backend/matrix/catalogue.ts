import type { Expectations } from './types.js';

export const CATALOGUE_EXPECTATIONS: Expectations = {};
