// knex imports the TypeScript migrations and seeds itself, outside Vitest's transform, so each test worker
// registers tsx as Node's loader for them. Component tests run under jsdom, where esbuild refuses to load (its
// TextEncoder check fails there), and they touch no database, so they go without.
if (typeof window === 'undefined') {
  const { register } = await import('tsx/esm/api');
  register();
}
