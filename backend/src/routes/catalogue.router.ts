import type { RouteDef } from './route.js';

export const catalogueRoutes: RouteDef[] = [];
