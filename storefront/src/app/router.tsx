import type { ComponentType } from 'react';
import { createBrowserRouter } from 'react-router-dom';
import { Loading } from '@ui/components/page-state.tsx';
import { RouteError } from '@ui/components/route-error.tsx';
import { paths } from '../config/paths.ts';
import { ShopLayout } from './layout.tsx';
import { HomePage } from './routes/home.tsx';
import { GarmentPage } from './routes/garment.tsx';
import { SignInPage } from './routes/sign-in.tsx';
import { NotFoundPage } from './routes/not-found.tsx';

/**
 * A page loaded only when someone opens it, so the catalogue's first download stays small: the designer brings the
 * canvas library and lettering fonts, checkout the form library.
 */
function lazyPage<Module, Name extends keyof Module>(
  path: string,
  load: () => Promise<Module>,
  name: Name & (Module[Name] extends ComponentType ? unknown : never),
  waiting: string,
) {
  return {
    path,
    lazy: () => load().then((module) => ({ Component: module[name] as ComponentType })),
    hydrateFallbackElement: <Loading label={waiting} />,
  };
}

export const router = createBrowserRouter([
  {
    element: <ShopLayout />,
    errorElement: <RouteError homeHref="/" />,
    children: [
      {
        // A page that fails to render is replaced inside the layout, so the header and sign-in stay usable.
        errorElement: <RouteError homeHref="/" />,
        children: [
          { path: paths.home.path, element: <HomePage /> },
          { path: paths.garment.path, element: <GarmentPage /> },
          lazyPage(paths.design.path, () => import('./routes/design.tsx'), 'DesignPage', 'Opening the designer…'),
          { path: paths.signIn.path, element: <SignInPage /> },
          lazyPage(paths.checkout.path, () => import('./routes/checkout.tsx'), 'CheckoutPage', 'Opening the checkout…'),
          lazyPage(paths.orders.path, () => import('./routes/orders.tsx'), 'OrdersPage', 'Fetching your orders…'),
          lazyPage(paths.order.path, () => import('./routes/order.tsx'), 'OrderPage', 'Fetching your order…'),
          lazyPage(paths.designs.path, () => import('./routes/designs.tsx'), 'DesignsPage', 'Fetching your designs…'),
          lazyPage(
            paths.shared.path,
            () => import('./routes/shared-design.tsx'),
            'SharedDesignPage',
            'Opening the shared design…',
          ),
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
]);
