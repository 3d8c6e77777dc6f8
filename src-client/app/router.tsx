import { createBrowserRouter } from 'react-router-dom';
import { NonIdealState } from '@blueprintjs/core';
import { AppShell } from './AppShell';
import { HomePage } from './HomePage';
import { RequireAuth } from './RequireAuth';
import { paths } from './routes/paths';
import { protectedRoutes } from './routes/protected-routes';
import { SignInPage } from '../features/auth/components/SignInPage';
import { AcceptInvitationPage } from '../features/auth/components/AcceptInvitationPage';
import { ResetPasswordPage } from '../features/auth/components/ResetPasswordPage';
import { ForgotPasswordPage } from '../features/auth/components/ForgotPasswordPage';

export const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInPage /> },
  { path: paths.acceptInvitation, element: <AcceptInvitationPage /> },
  { path: paths.resetPassword, element: <ResetPasswordPage /> },
  { path: paths.forgotPassword, element: <ForgotPasswordPage /> },
  {
    element: (
      <RequireAuth>
        <AppShell />
      </RequireAuth>
    ),
    children: [{ index: true, element: <HomePage /> }, ...protectedRoutes, { path: '*', element: <NonIdealState icon="search" title="No such page" /> }],
  },
]);
