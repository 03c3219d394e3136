/** The studio app's route table (served under /admin; the router's basename adds it). */
export const paths = {
  home: { path: '/', href: () => '/' },
  catalogue: { path: '/catalogue', href: () => '/catalogue' },
  order: { path: '/orders/:number', href: (number: string) => `/orders/${encodeURIComponent(number)}` },
  pricing: { path: '/pricing', href: () => '/pricing' },
  settings: { path: '/settings', href: () => '/settings' },
  people: { path: '/people', href: () => '/people' },
  outbox: { path: '/outbox', href: () => '/outbox' },
  outboxMessage: { path: '/outbox/:id', href: (id: number) => `/outbox/${id}` },
} as const;

export const basename = '/admin';
