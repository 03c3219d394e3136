import { createBrowserRouter } from 'react-router-dom';
import { RouteError } from '@ui/components/route-error.tsx';
import { basename, paths } from '../config/paths.ts';
import { StudioLayout } from './layout.tsx';
import { TodayPage } from './routes/today.tsx';
import { CataloguePage } from './routes/catalogue.tsx';
import { OrderPage } from './routes/order.tsx';
import { ProductionSheetPage } from './routes/production-sheet.tsx';
import { OrdersPage } from './routes/orders.tsx';
import { NotFoundPage } from './routes/not-found.tsx';
import { PricingPage } from './routes/pricing.tsx';
import { SettingsPage } from './routes/settings.tsx';
import { PeoplePage } from './routes/people.tsx';
import { OutboxPage } from './routes/outbox.tsx';

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
            { path: paths.home.path, element: <TodayPage /> },
            { path: paths.catalogue.path, element: <CataloguePage /> },
            { path: paths.orders.path, element: <OrdersPage /> },
            { path: paths.order.path, element: <OrderPage /> },
            { path: paths.productionSheet.path, element: <ProductionSheetPage /> },
            { path: paths.pricing.path, element: <PricingPage /> },
            { path: paths.settings.path, element: <SettingsPage /> },
            { path: paths.people.path, element: <PeoplePage /> },
            { path: paths.outbox.path, element: <OutboxPage /> },
            { path: paths.outboxMessage.path, element: <OutboxPage /> },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ],
  { basename },
);
