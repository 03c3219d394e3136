/** The storefront's only route table: a path pattern and an href builder for each page. */
export const paths = {
  home: { path: '/', href: () => '/' },
  garment: { path: '/garments/:slug', href: (slug: string) => `/garments/${encodeURIComponent(slug)}` },
  /** The designer; `designId` opens one of the customer's saved designs. */
  design: {
    path: '/design/:slug',
    href: (slug: string, designId?: number) =>
      `/design/${encodeURIComponent(slug)}${designId === undefined ? '' : `?design=${designId}`}`,
  },
  signIn: { path: '/sign-in', href: () => '/sign-in' },
  /** Ordering one of the customer's saved designs: quantity, date, address, then the card page. */
  checkout: { path: '/checkout/:designId', href: (designId: number) => `/checkout/${designId}` },
  orders: { path: '/orders', href: () => '/orders' },
  order: { path: '/orders/:number', href: (number: string) => `/orders/${encodeURIComponent(number)}` },
  /** The signed-in customer's saved designs. */
  designs: { path: '/designs', href: () => '/designs' },
  /** A design shared by its read-only link. */
  shared: { path: '/shared/:token', href: (token: string) => `/shared/${encodeURIComponent(token)}` },
} as const;
