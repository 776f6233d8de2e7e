import { Foundation1796163999055 } from './1796163999055-foundation.js';
import { Register1796164859341 } from './1796164859341-register.js';

/** Every migration in order. Never edit one that is on main: add a new one. */
export const MIGRATIONS = [Foundation1796163999055, Register1796164859341];
