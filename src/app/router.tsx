import { createBrowserRouter, Outlet, RouterProvider, ScrollRestoration, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/app/layouts/route-error';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { todayQueryOptions } from '@/features/today/api/get-today';
import { queryClient } from '@/lib/query-client';

// Every screen is its own chunk; the loader warms the session query so screens open without a flash.
const warmMe = () => queryClient.ensureQueryData(meQueryOptions());

function RootLayout() {
  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}

function FirstLoad() {
  return <p className="p-6 text-ink-muted">Opening Larderly…</p>;
}

/** Every route its own error boundary: a screen that fails shows what happened inside the layout, whose navigation still works. */
function withBoundaries(routes: RouteObject[]): RouteObject[] {
  return routes.map(
    (route) =>
      ({
        ErrorBoundary: RouteError,
        ...route,
        ...(route.children ? { children: withBoundaries(route.children) } : {}),
      }) as RouteObject,
  );
}

const routes = withBoundaries([
  {
    // The root: a new page starts at its top (and Back returns to where it was), and the first load shows a quiet placeholder.
    Component: RootLayout,
    HydrateFallback: FirstLoad,
    children: [
      {
        path: '/sign-in',
        loader: warmMe,
        lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
      },
      { path: '/sign-up', lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }) },
      {
        path: '/sign-up/confirm/:token',
        lazy: async () => ({ Component: (await import('./routes/sign-up-confirm')).SignUpConfirmRoute }),
      },
      {
        path: '/invite/:token',
        loader: warmMe,
        lazy: async () => ({ Component: (await import('./routes/invite')).InviteRoute }),
      },
      {
        loader: warmMe,
        lazy: async () => ({ Component: (await import('@/app/layouts/require-auth')).RequireAuth }),
        children: [
          { path: '/', lazy: async () => ({ Component: (await import('./routes/home-redirect')).HomeRedirect }) },
          // Outside the household layout: a label's page finds its household from the jar, and a label sheet prints bare.
          { path: '/j/:code', lazy: async () => ({ Component: (await import('./routes/jar')).JarRoute }) },
          {
            path: '/h/:hid/batches/:batchId/labels',
            lazy: async () => ({ Component: (await import('./routes/batch-labels')).BatchLabelsRoute }),
          },
          {
            path: '/h/:hid',
            lazy: async () => ({ Component: (await import('@/app/layouts/app-layout')).AppLayout }),
            children: [
              // The home page asks for its one read while its code is still loading.
              {
                index: true,
                loader: ({ params }) => {
                  void queryClient.prefetchQuery(todayQueryOptions(params.hid!));
                  return null;
                },
                lazy: async () => ({ Component: (await import('./routes/today')).TodayRoute }),
              },
              { path: 'week', lazy: async () => ({ Component: (await import('./routes/week')).WeekRoute }) },
              { path: 'shelf', lazy: async () => ({ Component: (await import('./routes/shelf')).ShelfRoute }) },
              { path: 'shelf/stock', lazy: async () => ({ Component: (await import('./routes/stock')).StockRoute }) },
              { path: 'fridge', lazy: async () => ({ Component: (await import('./routes/fridge')).FridgeRoute }) },
              { path: 'batches', lazy: async () => ({ Component: (await import('./routes/batches')).BatchesRoute }) },
              {
                path: 'batches/new',
                lazy: async () => ({ Component: (await import('./routes/batch-new')).NewBatchRoute }),
              },
              {
                path: 'batches/:batchId',
                lazy: async () => ({ Component: (await import('./routes/batch-detail')).BatchDetailRoute }),
              },
              { path: 'recipes', lazy: async () => ({ Component: (await import('./routes/recipes')).RecipesRoute }) },
              {
                path: 'recipes/new',
                lazy: async () => ({ Component: (await import('./routes/recipe-edit')).RecipeEditRoute }),
              },
              {
                path: 'recipes/:recipeId',
                lazy: async () => ({ Component: (await import('./routes/recipe-card')).RecipeCardRoute }),
              },
              {
                path: 'recipes/:recipeId/edit',
                lazy: async () => ({ Component: (await import('./routes/recipe-edit')).RecipeEditRoute }),
              },
              {
                path: 'products/new',
                lazy: async () => ({ Component: (await import('./routes/product-edit')).ProductEditRoute }),
              },
              {
                path: 'products/:productId',
                lazy: async () => ({ Component: (await import('./routes/product-edit')).ProductEditRoute }),
              },
              { path: 'restock', lazy: async () => ({ Component: (await import('./routes/restock')).RestockRoute }) },
              { path: 'todo', lazy: async () => ({ Component: (await import('./routes/todo')).TodoRoute }) },
              { path: 'setup', lazy: async () => ({ Component: (await import('./routes/setup')).SetupRoute }) },
              {
                path: 'household',
                lazy: async () => ({ Component: (await import('./routes/household')).HouseholdRoute }),
              },
              {
                path: 'household/mail',
                lazy: async () => ({ Component: (await import('./routes/dev-mail')).DevMailRoute }),
              },
            ],
          },
        ],
      },
      { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
    ],
  },
]);

// Made at the first render, not on import: its loaders start at once, and must find the cache restored and
// TanStack Query told whether there is a network (src/app/offline.ts).
let router: ReturnType<typeof createBrowserRouter> | undefined;

export function AppRouter() {
  router ??= createBrowserRouter(routes);
  return <RouterProvider router={router} />;
}
