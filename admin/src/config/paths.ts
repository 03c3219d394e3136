/** The studio app's route table (served under /admin; the router's basename adds it). */
export const paths = {
  home: { path: '/', href: () => '/' },
  catalogue: { path: '/catalogue', href: () => '/catalogue' },
  orders: { path: '/orders', href: () => '/orders' },
  order: { path: '/orders/:number', href: (number: string) => `/orders/${encodeURIComponent(number)}` },
  productionSheet: {
    path: '/orders/:number/production',
    href: (number: string) => `/orders/${encodeURIComponent(number)}/production`,
  },
  orderDesign: {
    path: '/orders/:number/design',
    href: (number: string) => `/orders/${encodeURIComponent(number)}/design`,
  },
  pricing: { path: '/pricing', href: () => '/pricing' },
  settings: { path: '/settings', href: () => '/settings' },
  people: { path: '/people', href: () => '/people' },
  outbox: { path: '/outbox', href: () => '/outbox' },
  outboxMessage: { path: '/outbox/:id', href: (id: number) => `/outbox/${id}` },
} as const;

export const basename = '/admin';
