import type { RouteDef } from './route.js';

export const csvRoutes: RouteDef[] = [];
