/** The storefront's only route table: a path pattern and an href builder for each page. */
export const paths = {
  home: { path: '/', href: () => '/' },
  garment: { path: '/garments/:slug', href: (slug: string) => `/garments/${encodeURIComponent(slug)}` },
  signIn: { path: '/sign-in', href: () => '/sign-in' },
} as const;
