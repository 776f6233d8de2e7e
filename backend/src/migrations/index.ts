import { Foundation1796163999055 } from './1796163999055-foundation.js';

/** Every migration in order. Never edit one that is on main: add a new one. */
export const MIGRATIONS = [Foundation1796163999055];
