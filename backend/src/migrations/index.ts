import { Foundation1796163999055 } from './1796163999055-foundation.js';
import { Register1796164859341 } from './1796164859341-register.js';
import { AssemblySerials1796166000000 } from './1796166000000-assembly-serials.js';
import { ImportJobs1796166100000 } from './1796166100000-import-jobs.js';

/** Every migration in order. Never edit one that is on main: add a new one. */
export const MIGRATIONS = [Foundation1796163999055, Register1796164859341, AssemblySerials1796166000000, ImportJobs1796166100000];
