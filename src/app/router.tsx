import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { queryClient } from '@/lib/query-client';

// Every screen is its own chunk; the loader warms the session query so screens open without a flash.
const warmMe = () => queryClient.ensureQueryData(meQueryOptions());

const router = createBrowserRouter([
  { path: '/sign-in', loader: warmMe, lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }) },
  { path: '/sign-up', lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }) },
  {
    loader: warmMe,
    lazy: async () => ({ Component: (await import('@/components/layouts/require-auth')).RequireAuth }),
    children: [
      { path: '/', lazy: async () => ({ Component: (await import('./routes/home-redirect')).HomeRedirect }) },
      {
        path: '/h/:hid',
        lazy: async () => ({ Component: (await import('@/components/layouts/app-layout')).AppLayout }),
        children: [
          { index: true, lazy: async () => ({ Component: (await import('./routes/today')).TodayRoute }) },
          { path: 'week', lazy: async () => ({ Component: (await import('./routes/week')).WeekRoute }) },
          { path: 'shelf', lazy: async () => ({ Component: (await import('./routes/shelf')).ShelfRoute }) },
          { path: 'fridge', lazy: async () => ({ Component: (await import('./routes/fridge')).FridgeRoute }) },
          { path: 'batches', lazy: async () => ({ Component: (await import('./routes/batches')).BatchesRoute }) },
          { path: 'recipes', lazy: async () => ({ Component: (await import('./routes/recipes')).RecipesRoute }) },
          { path: 'restock', lazy: async () => ({ Component: (await import('./routes/restock')).RestockRoute }) },
          { path: 'todo', lazy: async () => ({ Component: (await import('./routes/todo')).TodoRoute }) },
          { path: 'household', lazy: async () => ({ Component: (await import('./routes/household')).HouseholdRoute }) },
        ],
      },
    ],
  },
  { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
