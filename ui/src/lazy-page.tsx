import type { ComponentType } from 'react';
import { Loading } from './components/page-state.tsx';
import type { PageTitle } from './hooks/use-page-title.ts';

/**
 * A route whose page is downloaded only when someone opens it, so each app's first download stays small (and under
 * the build's chunk-size limit): the designer brings the canvas library and lettering fonts, checkout and the
 * studio's editors their form libraries, the production sheet its templates.
 */
export function lazyPage<Module, Name extends keyof Module>(
  path: string,
  load: () => Promise<Module>,
  name: Name & (Module[Name] extends ComponentType ? unknown : never),
  waiting: string,
  title?: PageTitle,
) {
  return {
    path,
    handle: { title },
    lazy: () => load().then((module) => ({ Component: module[name] as ComponentType })),
    hydrateFallbackElement: <Loading label={waiting} />,
  };
}
