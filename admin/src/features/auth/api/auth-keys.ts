/** Query keys of the auth feature; never write these arrays inline. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};
