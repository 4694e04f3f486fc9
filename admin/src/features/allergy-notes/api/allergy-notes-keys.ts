/** Query keys of the allergy-notes feature; never write these arrays inline. */
export const allergyNotesKeys = {
  all: ['allergy-notes'] as const,
  events: () => [...allergyNotesKeys.all, 'events'] as const,
  eventList: (from: string) => [...allergyNotesKeys.events(), from] as const,
  counts: () => [...allergyNotesKeys.all, 'counts'] as const,
  countsOf: (orderIds: readonly string[]) => [...allergyNotesKeys.counts(), [...orderIds]] as const,
  details: () => [...allergyNotesKeys.all, 'detail'] as const,
  detail: (orderId: string) => [...allergyNotesKeys.details(), orderId] as const,
  briefing: (orderId: string) => [...allergyNotesKeys.detail(orderId), 'briefing'] as const,
  accessLog: (orderId: string) => [...allergyNotesKeys.detail(orderId), 'access-log'] as const,
  dessert: (dessertId: string) => [...allergyNotesKeys.all, 'dessert', dessertId] as const,
  recipeChoices: () => [...allergyNotesKeys.all, 'recipe-choices'] as const,
};
