/** Keys of the app-wide queries: the signed-in user and the app's mode. Features keep their own. */
export const meKeys = {
  all: ['me'] as const,
};

export const metaKeys = {
  all: ['meta'] as const,
};
