import { FormEvent, useState } from 'react';
import { Link, Navigate, useLocation } from 'react-router-dom';
import { Button, Callout, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { useSession } from '../../../lib/session';
import { ApiError } from '../../../lib/api-client';
import { paths } from '../../../app/routes/paths';
import { useLogin } from '../api/login';
import { AuthLayout } from './AuthLayout';

export function SignInPage() {
  const { user, signIn, endedReason } = useSession();
  const location = useLocation();
  const login = useLogin();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const from = (location.state as { from?: string } | null)?.from ?? paths.home;

  if (user) return <Navigate to={from} replace />;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    login.mutate({ email, password }, { onSuccess: (result) => signIn(result.accessToken, result.user) });
  };
  const error = login.error instanceof ApiError ? login.error : null;

  return (
    <AuthLayout title="Sign in">
      {endedReason && !login.isPending && !error && (
        <Callout intent={Intent.WARNING} className="bw-gap">
          {endedReason}
        </Callout>
      )}
      {error && (
        <Callout intent={Intent.DANGER} className="bw-gap" role="alert">
          {error.code === 'AUTH_BAD_CREDENTIALS' ? 'E-mail or password is not correct.' : error.message}
        </Callout>
      )}
      <form onSubmit={submit}>
        <FormGroup label="E-mail" labelFor="sign-in-email">
          <InputGroup id="sign-in-email" type="email" autoComplete="username" value={email} onValueChange={setEmail} required autoFocus />
        </FormGroup>
        <FormGroup label="Password" labelFor="sign-in-password">
          <InputGroup id="sign-in-password" type="password" autoComplete="current-password" value={password} onValueChange={setPassword} required />
        </FormGroup>
        <Button type="submit" intent={Intent.PRIMARY} fill loading={login.isPending} text="Sign in" />
      </form>
      <p className="bw-auth__foot">
        <Link to={paths.forgotPassword}>Forgot your password?</Link>
      </p>
    </AuthLayout>
  );
}
