/** The studio app's route table (served under /admin; the router's basename adds it). */
export const paths = {
  home: { path: '/', href: () => '/' },
  catalogue: { path: '/catalogue', href: () => '/catalogue' },
} as const;

export const basename = '/admin';
