import { createBrowserRouter } from 'react-router-dom';
import { basename, paths } from '../config/paths.ts';
import { StudioLayout } from './layout.tsx';
import { TodayPage } from './routes/today.tsx';
import { NotFoundPage } from './routes/not-found.tsx';

export const router = createBrowserRouter(
  [
    {
      element: <StudioLayout />,
      children: [
        { path: paths.home.path, element: <TodayPage /> },
        { path: '*', element: <NotFoundPage /> },
      ],
    },
  ],
  { basename },
);
