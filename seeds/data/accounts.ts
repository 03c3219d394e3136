/** Fixed user ids, in the order of demoPeople, so the scenario can name who did what. */
export const userIds = { marigold: 1, tobias: 2, priya: 3, harriet: 4, dominic: 5 } as const;

export type CustomerKey = 'priya' | 'harriet' | 'dominic';
export type StudioKey = 'marigold' | 'tobias';

/** When each person's account was created (by Google subject id): the studio at set-up, customers at first sign-in. */
export const joinedAtBySub: Record<string, string> = {
  'demo-owner-marigold': '2026-11-01T14:00',
  'demo-staff-tobias': '2026-11-01T14:05',
  'demo-customer-priya': '2026-11-08T21:20',
  'demo-customer-harriet': '2026-11-07T15:45',
  'demo-customer-dominic': '2026-11-11T02:15',
};
