import { roleMay, type Action } from '../../../shared/src/permissions.js';
import { ForbiddenError } from '../errors.js';
import type { Actor } from './actor.js';

/** Throws a 403 unless the actor's role may take the action. Site scoping is the caller's load. */
export function authorize(actor: Actor, action: Action): void {
  if (!roleMay(actor.role, action)) throw new ForbiddenError();
}

export function abilitiesOf(actor: Pick<Actor, 'role'>, actions: readonly Action[]): Action[] {
  return actions.filter((a) => roleMay(actor.role, a));
}
