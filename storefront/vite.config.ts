import { appConfig } from '../vite.base.ts';

export default appConfig('storefront', 5173);
