import { createBrowserRouter, matchRoutes, type RouteObject } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { LoadingState } from '../components/ui/spinner';
import { PAGE_ROLES } from './access';
import { RequireAuth, RequireRole } from './guards';
import { NotFoundPage } from './routes/not-found';
import { RouteErrorPage } from './routes/route-error';
import { RootLayout } from './shell/root-layout';

// The shell and the not-found page ship with the first load; each page's code loads on its first visit.
export const routes: RouteObject[] = [
  {
    element: <RootLayout />,
    children: [
      {
        // Pathless: a crash in a page shows inside the layout, with the header still there.
        errorElement: <RouteErrorPage />,
        // Shown inside the layout on the very first load while that page's code arrives.
        hydrateFallbackElement: <LoadingState label="Opening the page…" className="justify-center py-24" />,
        children: [
          { index: true, id: 'kitchen', lazy: () => import('./routes/kitchen').then((m) => ({ Component: m.KitchenPage })) },
          { path: 'foods', lazy: () => import('./routes/foods').then((m) => ({ Component: m.FoodsPage })) },
          { path: 'foods/:id', lazy: () => import('./routes/food-detail').then((m) => ({ Component: m.FoodDetailPage })) },
          { path: 'sign-in', lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInPage })) },
          { path: 'sign-up', lazy: () => import('./routes/sign-up').then((m) => ({ Component: m.SignUpPage })) },
          { path: 'forgot-password', lazy: () => import('./routes/forgot-password').then((m) => ({ Component: m.ForgotPasswordPage })) },
          { path: 'reset-password/:token', lazy: () => import('./routes/reset-password').then((m) => ({ Component: m.ResetPasswordPage })) },
          { path: 'invitations/:token', lazy: () => import('./routes/invitation').then((m) => ({ Component: m.InvitationPage })) },
          {
            element: <RequireAuth />,
            children: [
              { path: 'account', lazy: () => import('./routes/account').then((m) => ({ Component: m.AccountPage })) },
              // owner or their coach: the server decides who may read the version
              { path: 'recipes/:id/versions/:number/prep', lazy: () => import('./routes/prep').then((m) => ({ Component: m.PrepPage })) },
            ],
          },
          {
            element: <RequireRole roles={PAGE_ROLES.recipeBook} />,
            children: [
              {
                path: 'recipes',
                id: 'recipe-book',
                lazy: () => import('./routes/recipe-book').then((m) => ({ Component: m.RecipeBookPage })),
              },
              {
                path: 'recipes/:id',
                lazy: () => import('./routes/recipe-detail').then((m) => ({ Component: m.RecipeDetailPage })),
              },
              {
                path: 'recipes/:id/compare',
                lazy: () => import('./routes/recipe-compare').then((m) => ({ Component: m.RecipeComparePage })),
              },
              {
                path: 'recipes/:id/print',
                lazy: () => import('./routes/recipe-print').then((m) => ({ Component: m.RecipePrintPage })),
              },
              { path: 'shopping', lazy: () => import('./routes/shopping-list').then((m) => ({ Component: m.ShoppingListPage })) },
            ],
          },
          {
            element: <RequireRole roles={PAGE_ROLES.myFoods} />,
            children: [{ path: 'my-foods', lazy: () => import('./routes/my-foods').then((m) => ({ Component: m.MyFoodsPage })) }],
          },
          {
            element: <RequireRole roles={PAGE_ROLES.myCoach} />,
            children: [{ path: 'coach', lazy: () => import('./routes/my-coach').then((m) => ({ Component: m.MyCoachPage })) }],
          },
          {
            element: <RequireRole roles={PAGE_ROLES.swapLibrary} />,
            children: [
              {
                path: 'swaps',
                lazy: () => import('./routes/swap-library').then((m) => ({ Component: m.SwapLibraryPage })),
              },
            ],
          },
          {
            element: <RequireRole roles={PAGE_ROLES.clients} />,
            children: [
              { path: 'clients', lazy: () => import('./routes/clients').then((m) => ({ Component: m.ClientsPage })) },
              { path: 'clients/:id', lazy: () => import('./routes/client-detail').then((m) => ({ Component: m.ClientDetailPage })) },
              {
                path: 'clients/:id/versions/:recipeId/:number',
                lazy: () => import('./routes/client-version').then((m) => ({ Component: m.ClientVersionPage })),
              },
            ],
          },
          {
            path: 'admin',
            element: <RequireRole roles={PAGE_ROLES.admin} />,
            children: [
              { path: 'users', lazy: () => import('./routes/people').then((m) => ({ Component: m.PeoplePage })) },
              { path: 'outbox', lazy: () => import('./routes/outbox').then((m) => ({ Component: m.OutboxPage })) },
              { index: true, element: <NotFoundPage /> },
            ],
          },
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
];

/**
 * Loads the code of the routes `pathname` opens and puts it on the route objects, so the first
 * render has the page itself rather than the loading fallback: needed to hydrate HTML the server
 * drew, and to replace it without a flash of the fallback.
 */
export async function loadRoutesFor(pathname: string): Promise<void> {
  const lazyMatches = (matchRoutes(routes, pathname) ?? []).filter((m) => typeof m.route.lazy === 'function');
  await Promise.all(
    lazyMatches.map(async ({ route }) => {
      const load = route.lazy as () => Promise<Partial<RouteObject>>;
      Object.assign(route, { ...(await load()), lazy: undefined });
    }),
  );
}

export function createAppRouter() {
  return createBrowserRouter(routes);
}

export function AppRouter({ router }: { router: ReturnType<typeof createAppRouter> }) {
  return <RouterProvider router={router} />;
}
