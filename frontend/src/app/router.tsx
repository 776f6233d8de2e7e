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
        ],
      },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
