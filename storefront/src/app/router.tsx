import { createBrowserRouter } from 'react-router-dom';
import { Loading } from '@ui/components/page-state.tsx';
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
          { path: paths.home.path, element: <HomePage /> },
          { path: paths.garment.path, element: <GarmentPage /> },
          // Lazy, so the garments and other pages never download the canvas library and lettering fonts.
          {
            path: paths.design.path,
            lazy: () => import('./routes/design.tsx').then(({ DesignPage }) => ({ Component: DesignPage })),
            hydrateFallbackElement: <Loading label="Opening the designer…" />,
          },
          { path: paths.signIn.path, element: <SignInPage /> },
          // Lazy: the form library and the order pages are for customers who order, not for browsing.
          {
            path: paths.checkout.path,
            lazy: () => import('./routes/checkout.tsx').then(({ CheckoutPage }) => ({ Component: CheckoutPage })),
            hydrateFallbackElement: <Loading label="Opening the checkout…" />,
          },
          {
            path: paths.orders.path,
            lazy: () => import('./routes/orders.tsx').then(({ OrdersPage }) => ({ Component: OrdersPage })),
            hydrateFallbackElement: <Loading label="Fetching your orders…" />,
          },
          {
            path: paths.order.path,
            lazy: () => import('./routes/order.tsx').then(({ OrderPage }) => ({ Component: OrderPage })),
            hydrateFallbackElement: <Loading label="Fetching your order…" />,
          },
          // Lazy too: only customers with saved designs, and people opening a shared link, need these.
          {
            path: paths.designs.path,
            lazy: () => import('./routes/designs.tsx').then(({ DesignsPage }) => ({ Component: DesignsPage })),
            hydrateFallbackElement: <Loading label="Fetching your designs…" />,
          },
          {
            path: paths.shared.path,
            lazy: () => import('./routes/shared-design.tsx').then(({ SharedDesignPage }) => ({ Component: SharedDesignPage })),
            hydrateFallbackElement: <Loading label="Opening the shared design…" />,
          },
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
]);
