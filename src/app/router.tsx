import { createBrowserRouter, Navigate, Outlet, RouterProvider, ScrollRestoration } from 'react-router-dom';
import { AppShell } from '../components/app-shell';
import { useMe } from '../features/auth/api/get-me';
import { AccountMenu } from '../features/auth/components/account-menu';
import { accountRoutes } from './account-routes';
import { roleNavItems } from './role-nav';
import { HomeRoute } from './routes/home';
import { HowItWorksRoute } from './routes/how-it-works';
import { LibraryRoute } from './routes/library';
import { NotFoundRoute } from './routes/not-found';
import { RouteErrorBoundary } from './routes/route-error';

function RootLayout() {
  const me = useMe();
  return (
    <AppShell roleNavItems={roleNavItems(me.data)} account={<AccountMenu />}>
      <Outlet />
      <ScrollRestoration />
    </AppShell>
  );
}

const calculatorRoute = () => import('./routes/calculator').then((m) => ({ Component: m.CalculatorRoute }));
// Swagger UI is most of this page's weight: it loads only when someone opens the reference.
const apiReferenceRoute = () => import('./routes/api-reference').then((m) => ({ Component: m.ApiReferenceRoute }));

export const router = createBrowserRouter([
  {
    path: '/',
    element: <RootLayout />,
    errorElement: <RouteErrorBoundary />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: 'templates', element: <LibraryRoute /> },
      // The calculator (RJSF, the drawings) loads with its own route, so the library stays light.
      { path: 'templates/:slug', lazy: calculatorRoute },
      { path: 'templates/:slug/v/:version', lazy: calculatorRoute },
      // The library's first address, kept so old links still arrive.
      { path: 'library', element: <Navigate to="/templates" replace /> },
      { path: 'how-it-works', element: <HowItWorksRoute /> },
      { path: 'developers/api', lazy: apiReferenceRoute },
      ...accountRoutes,
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
