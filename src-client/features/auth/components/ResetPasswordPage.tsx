import { Navigate, useSearchParams } from 'react-router-dom';
import { Callout, Intent } from '@blueprintjs/core';
import { useSession } from '../../../lib/session';
import { paths } from '../../../app/routes/paths';
import { useResetPassword } from '../api/reset-password';
import { AuthLayout } from './AuthLayout';
import { SetPasswordForm } from './SetPasswordForm';

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const { signIn } = useSession();
  const reset = useResetPassword();
  if (reset.isSuccess) return <Navigate to={paths.home} replace />;

  return (
    <AuthLayout title="Choose a new password">
      {!token ? (
        <Callout intent={Intent.DANGER}>This page needs the link from your password-reset e-mail.</Callout>
      ) : (
        <SetPasswordForm
          submitText="Save password and sign in"
          pending={reset.isPending}
          error={reset.error}
          onSubmit={(values) => reset.mutate({ token, password: values.password }, { onSuccess: (r) => signIn(r.accessToken, r.user) })}
        />
      )}
    </AuthLayout>
  );
}
