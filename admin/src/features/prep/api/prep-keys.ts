import type { DateRange } from './types';

/** Query keys of the prep feature; never write these arrays inline. */
export const prepKeys = {
  all: ['prep'] as const,
  plans: () => [...prepKeys.all, 'plan'] as const,
  plan: (range: DateRange) => [...prepKeys.plans(), range.from, range.to] as const,
  schedules: () => [...prepKeys.all, 'schedule'] as const,
  schedule: (date: string) => [...prepKeys.schedules(), date] as const,
  label: (recipeId: string) => [...prepKeys.all, 'label', recipeId] as const,
  events: (range: DateRange) => [...prepKeys.all, 'events', range.from, range.to] as const,
  waitingRequests: () => [...prepKeys.all, 'waiting-requests'] as const,
};
