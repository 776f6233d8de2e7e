export const referenceKeys = {
  all: ['reference'] as const,
};
