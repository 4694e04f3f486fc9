/** Query keys of the account screens, the same in both apps; never write these arrays inline. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};
