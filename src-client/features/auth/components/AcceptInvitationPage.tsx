import { Navigate, useSearchParams } from 'react-router-dom';
import { Callout, Intent } from '@blueprintjs/core';
import { useSession } from '../../../lib/session';
import { paths } from '../../../app/routes/paths';
import { useAcceptInvitation } from '../api/accept-invitation';
import { AuthLayout } from './AuthLayout';
import { SetPasswordForm } from './SetPasswordForm';

export function AcceptInvitationPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const { user, signIn } = useSession();
  const accept = useAcceptInvitation();
  if (user && accept.isSuccess) return <Navigate to={paths.home} replace />;

  return (
    <AuthLayout title="Join Bandwright">
      {!token ? (
        <Callout intent={Intent.DANGER}>This page needs the link from your invitation e-mail.</Callout>
      ) : (
        <SetPasswordForm
          askName
          submitText="Set password and sign in"
          pending={accept.isPending}
          error={accept.error}
          onSubmit={(values) => accept.mutate({ token, ...values }, { onSuccess: (r) => signIn(r.accessToken, r.user) })}
        />
      )}
    </AuthLayout>
  );
}
