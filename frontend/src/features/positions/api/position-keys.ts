/** Keys of positions and of what the position page shows beside one. */
export const positionKeys = {
  all: ['positions'] as const,
  details: () => [...positionKeys.all, 'detail'] as const,
  detail: (id: string) => [...positionKeys.details(), id] as const,
  history: (id: string) => [...positionKeys.all, 'history', id] as const,
};

/** The assembly in a position, as the position page reads it; under the assemblies' root so any change to assemblies refreshes it. */
export const positionAssemblyKeys = {
  all: ['assemblies'] as const,
  detail: (id: string) => [...positionAssemblyKeys.all, 'position-page', id] as const,
};
