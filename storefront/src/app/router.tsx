import { createBrowserRouter } from 'react-router-dom';
import { lazyPage } from '@ui/lazy-page.tsx';
import { RouteError } from '@ui/components/route-error.tsx';
import { paths } from '../config/paths.ts';
import { ShopLayout } from './layout.tsx';
import { HomePage } from './routes/home.tsx';
import { GarmentPage } from './routes/garment.tsx';
import { SignInPage } from './routes/sign-in.tsx';
import { NotFoundPage } from './routes/not-found.tsx';

export const router = createBrowserRouter([
  {
    element: <ShopLayout />,
    errorElement: <RouteError homeHref="/" />,
    children: [
      {
        // A page that fails to render is replaced inside the layout, so the header and sign-in stay usable.
        errorElement: <RouteError homeHref="/" />,
        children: [
          { path: paths.home.path, element: <HomePage />, handle: { title: 'Garments to personalize' } },
          { path: paths.garment.path, element: <GarmentPage /> },
          lazyPage(paths.design.path, () => import('./routes/design.tsx'), 'DesignPage', 'Opening the designer…'),
          { path: paths.signIn.path, element: <SignInPage />, handle: { title: 'Sign in' } },
          lazyPage(
            paths.checkout.path,
            () => import('./routes/checkout.tsx'),
            'CheckoutPage',
            'Opening the checkout…',
            'Checkout',
          ),
          lazyPage(
            paths.orders.path,
            () => import('./routes/orders.tsx'),
            'OrdersPage',
            'Fetching your orders…',
            'Your orders',
          ),
          lazyPage(
            paths.order.path,
            () => import('./routes/order.tsx'),
            'OrderPage',
            'Fetching your order…',
            (params) => `Order ${params.number ?? ''}`,
          ),
          lazyPage(
            paths.designs.path,
            () => import('./routes/designs.tsx'),
            'DesignsPage',
            'Fetching your designs…',
            'Your designs',
          ),
          lazyPage(
            paths.shared.path,
            () => import('./routes/shared-design.tsx'),
            'SharedDesignPage',
            'Opening the shared design…',
            'A shared design',
          ),
          { path: '*', element: <NotFoundPage />, handle: { title: 'Page not found' } },
        ],
      },
    ],
  },
]);
