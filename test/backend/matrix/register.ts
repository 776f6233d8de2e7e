import type { Expectations } from './types.js';

export const REGISTER_EXPECTATIONS: Expectations = {};
