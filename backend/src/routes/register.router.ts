import type { RouteDef } from './route.js';

export const registerRoutes: RouteDef[] = [];
