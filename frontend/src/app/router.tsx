import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { FullPageSpinner } from '@/components/ui/spinner';
import { AppLayout } from './routes/app/layout';
import { HomePage } from './routes/app/home';
import { PreferencesPage } from './routes/app/preferences';
import { AcceptInvitePage } from './routes/auth/accept-invite';
import { ForgotPasswordPage } from './routes/auth/forgot-password';
import { AuthRouteLayout } from './routes/auth/layout';
import { ResetPasswordPage } from './routes/auth/reset-password';
import { SetupPage } from './routes/auth/setup';
import { SignInPage } from './routes/auth/sign-in';
import { NotFoundPage } from './routes/not-found';
import { RootLayout } from './routes/root';
import { RouteError } from './routes/route-error';

export const routes: RouteObject[] = [
  {
    element: <RootLayout />,
    errorElement: <RouteError />,
    // Shown while the code of a page opened directly (say /users) is still arriving.
    hydrateFallbackElement: <FullPageSpinner label="Starting Ferrule…" />,
    children: [
      {
        element: <AuthRouteLayout />,
        children: [
          { path: paths.auth.signIn.path, element: <SignInPage /> },
          { path: paths.auth.forgotPassword.path, element: <ForgotPasswordPage /> },
          { path: paths.auth.resetPassword.path, element: <ResetPasswordPage /> },
          { path: paths.auth.acceptInvite.path, element: <AcceptInvitePage /> },
          { path: paths.auth.setup.path, element: <SetupPage /> },
        ],
      },
      {
        element: <AppLayout />,
        children: [
          { path: paths.home.path, element: <HomePage /> },
          { path: paths.preferences.path, element: <PreferencesPage /> },
          // User administration is for a few people; everyone else never downloads it.
          { path: paths.users.list.path, lazy: () => import('./routes/app/users/users').then((m) => ({ Component: m.UsersPage })) },
          { path: paths.users.detail.path, lazy: () => import('./routes/app/users/user').then((m) => ({ Component: m.UserPage })) },
          { path: paths.register.path, lazy: () => import('./routes/app/register/register').then((m) => ({ Component: m.RegisterPage })) },
          { path: paths.positions.create.path, lazy: () => import('./routes/app/positions/new-position').then((m) => ({ Component: m.NewPositionPage })) },
          { path: paths.positions.detail.path, lazy: () => import('./routes/app/positions/position').then((m) => ({ Component: m.PositionPage })) },
          { path: paths.find.path, lazy: () => import('./routes/app/field/find').then((m) => ({ Component: m.FindPage })) },
          { path: paths.assemblies.create.path, lazy: () => import('./routes/app/assemblies/new-assembly').then((m) => ({ Component: m.NewAssemblyPage })) },
          { path: paths.assemblies.replace.path, lazy: () => import('./routes/app/assemblies/replace').then((m) => ({ Component: m.ReplacePage })) },
          { path: paths.assemblies.detail.path, lazy: () => import('./routes/app/assemblies/assembly').then((m) => ({ Component: m.AssemblyPage })) },
          { path: paths.catalogue.constructions.path, lazy: () => import('./routes/app/catalogue/constructions').then((m) => ({ Component: m.ConstructionsPage })) },
          { path: paths.catalogue.construction.path, lazy: () => import('./routes/app/catalogue/construction').then((m) => ({ Component: m.ConstructionPage })) },
          { path: paths.catalogue.fittings.path, lazy: () => import('./routes/app/catalogue/fittings').then((m) => ({ Component: m.FittingTypesPage })) },
          { path: paths.catalogue.fitting.path, lazy: () => import('./routes/app/catalogue/fitting').then((m) => ({ Component: m.FittingTypePage })) },
          { path: paths.catalogue.services.path, lazy: () => import('./routes/app/catalogue/services').then((m) => ({ Component: m.ServicesPage })) },
          { path: paths.catalogue.places.path, lazy: () => import('./routes/app/catalogue/places').then((m) => ({ Component: m.PlacesPage })) },
          { path: paths.importCsv.path, lazy: () => import('./routes/app/import/import').then((m) => ({ Component: m.ImportPage })) },
        ],
      },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
