import { createBrowserRouter, Outlet, RouterProvider, ScrollRestoration } from 'react-router-dom';
import { AppShell } from '../components/app-shell';
import { HomeRoute } from './routes/home';
import { HowItWorksRoute } from './routes/how-it-works';
import { LibraryRoute } from './routes/library';
import { NotFoundRoute } from './routes/not-found';
import { RouteErrorBoundary } from './routes/route-error';

function RootLayout() {
  return (
    <AppShell>
      <Outlet />
      <ScrollRestoration />
    </AppShell>
  );
}

export const router = createBrowserRouter([
  {
    path: '/',
    element: <RootLayout />,
    errorElement: <RouteErrorBoundary />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: 'library', element: <LibraryRoute /> },
      { path: 'how-it-works', element: <HowItWorksRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
