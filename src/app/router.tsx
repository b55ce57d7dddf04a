import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { Loading } from '@/components/ui/states';
import { AppShell } from './layout/app-shell';
import { RequireSession } from './layout/require-session';
import { RouteError } from './routes/route-error';

/** Routes are split: each screen's code loads when it is first opened. */
const router = createBrowserRouter([
  { path: '/sign-in', hydrateFallbackElement: <Loading />, lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })) },
  { path: '/forgot-password', hydrateFallbackElement: <Loading />, lazy: () => import('./routes/forgot-password').then((m) => ({ Component: m.ForgotPasswordRoute })) },
  { path: '/reset-password', hydrateFallbackElement: <Loading />, lazy: () => import('./routes/reset-password').then((m) => ({ Component: m.ResetPasswordRoute })) },
  { path: '/accept-invitation', hydrateFallbackElement: <Loading />, lazy: () => import('./routes/accept-invitation').then((m) => ({ Component: m.AcceptInvitationRoute })) },
  {
    element: <RequireSession />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <Loading />,
    children: [
      // Printable pages: signed in, but without the rail.
      { path: 'shortlists/:id/dossier', lazy: () => import('./routes/shortlist-dossier').then((m) => ({ Component: m.ShortlistDossierRoute })) },
      {
        element: <AppShell />,
        errorElement: <RouteError />,
        children: [
          { index: true, lazy: () => import('./routes/overview').then((m) => ({ Component: m.OverviewRoute })) },
          { path: 'map', lazy: () => import('./routes/map').then((m) => ({ Component: m.MapRoute })) },
          { path: 'recipes', lazy: () => import('./routes/recipes').then((m) => ({ Component: m.RecipesRoute })) },
          { path: 'recipes/new', lazy: () => import('./routes/recipe-editor').then((m) => ({ Component: m.NewRecipeRoute })) },
          { path: 'recipes/:code', lazy: () => import('./routes/recipe-detail').then((m) => ({ Component: m.RecipeDetailRoute })) },
          { path: 'recipes/:code/edit', lazy: () => import('./routes/recipe-editor').then((m) => ({ Component: m.EditRecipeRoute })) },
          { path: 'team', lazy: () => import('./routes/team').then((m) => ({ Component: m.TeamRoute })) },
          { path: 'bench', lazy: () => import('./routes/bench').then((m) => ({ Component: m.BenchRoute })) },
          { path: 'shortlists', lazy: () => import('./routes/shortlists').then((m) => ({ Component: m.ShortlistsRoute })) },
          { path: 'shortlists/:id', lazy: () => import('./routes/shortlist').then((m) => ({ Component: m.ShortlistRoute })) },
          { path: 'library', lazy: () => import('./routes/library').then((m) => ({ Component: m.LibraryRoute })) },
          { path: 'find', lazy: () => import('./routes/find').then((m) => ({ Component: m.FindRoute })) },
          { path: 'calibrate', lazy: () => import('./routes/calibrate').then((m) => ({ Component: m.CalibrateRoute })) },
          { path: 'plan', lazy: () => import('./routes/plan').then((m) => ({ Component: m.PlanRoute })) },
          { path: '*', lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })) },
        ],
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
