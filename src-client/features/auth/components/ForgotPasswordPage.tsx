import { FormEvent, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button, Callout, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { paths } from '../../../app/routes/paths';
import { useRequestPasswordReset } from '../api/request-reset';
import { AuthLayout } from './AuthLayout';

export function ForgotPasswordPage() {
  const [email, setEmail] = useState('');
  const request = useRequestPasswordReset();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    request.mutate(email);
  };

  return (
    <AuthLayout title="Reset your password">
      {request.isSuccess ? (
        <Callout intent={Intent.SUCCESS}>If {email} has an account, a reset link is on its way. It works once, for one hour.</Callout>
      ) : (
        <form onSubmit={submit}>
          {request.error && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {(request.error as Error).message}
            </Callout>
          )}
          <FormGroup label="E-mail" labelFor="forgot-email">
            <InputGroup id="forgot-email" type="email" value={email} onValueChange={setEmail} required autoFocus />
          </FormGroup>
          <Button type="submit" intent={Intent.PRIMARY} fill loading={request.isPending} text="Send reset link" />
        </form>
      )}
      <p className="bw-auth__foot">
        <Link to={paths.signIn}>Back to sign-in</Link>
      </p>
    </AuthLayout>
  );
}
