// knex imports the TypeScript migrations and seeds itself, outside Vitest's transform, so each test worker
// registers tsx as Node's loader for them.
import { register } from 'tsx/esm/api';

register();
