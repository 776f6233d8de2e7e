/**
 * Keys of the register and catalogue records the assembly screens look up. Each sits under its
 * resource's root (`positions`, `constructions` …) so a change anywhere refreshes them, with a
 * segment of its own so it never shares an entry with another screen's shape of the same data.
 */
export const lookupKeys = {
  positions: {
    all: ['positions'] as const,
    list: (query: Record<string, unknown>) => ['positions', 'lookup', 'list', query] as const,
    detail: (id: string) => ['positions', 'lookup', 'detail', id] as const,
  },
  equipment: {
    all: ['equipment'] as const,
    list: (query: Record<string, unknown>) => ['equipment', 'lookup', 'list', query] as const,
    detail: (id: string) => ['equipment', 'lookup', 'detail', id] as const,
  },
  constructions: {
    list: (query: Record<string, unknown>) => ['constructions', 'lookup', 'list', query] as const,
    detail: (id: string) => ['constructions', 'lookup', 'detail', id] as const,
  },
  fittingTypes: {
    list: () => ['fitting-types', 'lookup', 'list'] as const,
    detail: (id: string) => ['fitting-types', 'lookup', 'detail', id] as const,
  },
  services: {
    list: (siteId: string) => ['site-services', 'lookup', siteId] as const,
  },
  sites: {
    detail: (id: string) => ['sites', 'lookup', 'detail', id] as const,
  },
};
