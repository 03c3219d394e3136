import { createBrowserRouter } from 'react-router-dom';
import { Loading } from '@ui/components/page-state.tsx';
import { RouteError } from '@ui/components/route-error.tsx';
import { paths } from '../config/paths.ts';
import { ShopLayout } from './layout.tsx';
import { HomePage } from './routes/home.tsx';
import { GarmentPage } from './routes/garment.tsx';
import { SignInPage } from './routes/sign-in.tsx';
import { NotFoundPage } from './routes/not-found.tsx';
import { DesignsPage } from './routes/designs.tsx';
import { SharedDesignPage } from './routes/shared-design.tsx';

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
          { path: paths.designs.path, element: <DesignsPage /> },
          { path: paths.shared.path, element: <SharedDesignPage /> },
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
]);
