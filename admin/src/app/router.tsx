import { createBrowserRouter } from 'react-router-dom';
import { RouteError } from '@ui/components/route-error.tsx';
import { lazyPage } from '@ui/lazy-page.tsx';
import { basename, paths } from '../config/paths.ts';
import { StudioLayout } from './layout.tsx';
import { TodayPage } from './routes/today.tsx';
import { NotFoundPage } from './routes/not-found.tsx';

const studioHome = `${basename}/`;

export const router = createBrowserRouter(
  [
    {
      element: <StudioLayout />,
      errorElement: <RouteError homeHref={studioHome} />,
      children: [
        {
          // A page that fails to render is replaced inside the layout, so navigation stays usable.
          errorElement: <RouteError homeHref={studioHome} />,
          children: [
            { path: paths.home.path, element: <TodayPage />, handle: { title: 'Today' } },
            // Only Today is in the first download; every other page (and its editors) comes when opened.
            lazyPage(
              paths.catalogue.path,
              () => import('./routes/catalogue.tsx'),
              'CataloguePage',
              'Opening the catalogue…',
            ),
            lazyPage(
              paths.orders.path,
              () => import('./routes/orders.tsx'),
              'OrdersPage',
              'Fetching the orders…',
              'Orders',
            ),
            lazyPage(
              paths.order.path,
              () => import('./routes/order.tsx'),
              'OrderPage',
              'Fetching the order…',
              (params) => `Order ${params.number ?? ''}`,
            ),
            lazyPage(
              paths.orderDesign.path,
              () => import('./routes/order-design.tsx'),
              'OrderDesignPage',
              'Opening the design…',
              (params) => `Change the design of ${params.number ?? ''}`,
            ),
            lazyPage(
              paths.productionSheet.path,
              () => import('./routes/production-sheet.tsx'),
              'ProductionSheetPage',
              'Preparing the production sheet…',
              (params) => `Production sheet ${params.number ?? ''}`,
            ),
            lazyPage(
              paths.pricing.path,
              () => import('./routes/pricing.tsx'),
              'PricingPage',
              'Opening the price lists…',
            ),
            lazyPage(
              paths.settings.path,
              () => import('./routes/settings.tsx'),
              'SettingsPage',
              'Opening the settings…',
            ),
            lazyPage(
              paths.people.path,
              () => import('./routes/people.tsx'),
              'PeoplePage',
              'Fetching the studio team…',
              'Studio team',
            ),
            lazyPage(
              paths.outbox.path,
              () => import('./routes/outbox.tsx'),
              'OutboxPage',
              'Opening the outbox…',
              'Outbox',
            ),
            lazyPage(
              paths.outboxMessage.path,
              () => import('./routes/outbox.tsx'),
              'OutboxPage',
              'Opening the outbox…',
            ),
            { path: '*', element: <NotFoundPage />, handle: { title: 'Page not found' } },
          ],
        },
      ],
    },
  ],
  { basename },
);
