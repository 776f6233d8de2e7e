import type { RouteDef } from './route.js';

export const assemblyRoutes: RouteDef[] = [];
