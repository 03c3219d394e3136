import { appConfig } from '../vite.base.ts';

export default appConfig('admin', 5174);
