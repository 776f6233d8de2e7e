import type { Expectations } from './types.js';

export const ASSEMBLY_EXPECTATIONS: Expectations = {};
