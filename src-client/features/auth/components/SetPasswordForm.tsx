import { FormEvent, useState } from 'react';
import { Button, Callout, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';

export interface SetPasswordFormProps {
  /** Ask for a display name too (invitations). @default false */
  askName?: boolean;
  submitText: string;
  pending: boolean;
  error: unknown;
  onSubmit: (values: { password: string; name?: string }) => void;
}

const MIN_PASSWORD = 10;

/** New password twice, checked here before the server checks it again. */
export function SetPasswordForm({ askName = false, submitText, pending, error, onSubmit }: SetPasswordFormProps) {
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [touched, setTouched] = useState(false);
  const apiError = error instanceof ApiError ? error : null;
  const tooShort = password.length < MIN_PASSWORD;
  const differs = repeat !== password;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setTouched(true);
    if (tooShort || differs) return;
    onSubmit({ password, ...(askName && name ? { name } : {}) });
  };

  return (
    <form onSubmit={submit}>
      {apiError && (
        <Callout intent={Intent.DANGER} className="bw-gap" role="alert">
          {apiError.fieldErrors.password ? `Password ${apiError.fieldErrors.password}` : apiError.message}
        </Callout>
      )}
      {askName && (
        <FormGroup label="Your name" labelFor="set-password-name" helperText="Leave empty to keep the name your admin entered.">
          <InputGroup id="set-password-name" value={name} onValueChange={setName} maxLength={120} />
        </FormGroup>
      )}
      <FormGroup
        label="New password"
        labelFor="set-password-new"
        intent={touched && tooShort ? Intent.DANGER : Intent.NONE}
        helperText={touched && tooShort ? `At least ${MIN_PASSWORD} characters` : `At least ${MIN_PASSWORD} characters`}
      >
        <InputGroup id="set-password-new" type="password" autoComplete="new-password" value={password} onValueChange={setPassword} required />
      </FormGroup>
      <FormGroup
        label="Repeat the password"
        labelFor="set-password-repeat"
        intent={touched && differs ? Intent.DANGER : Intent.NONE}
        helperText={touched && differs ? 'The two passwords differ' : undefined}
      >
        <InputGroup id="set-password-repeat" type="password" autoComplete="new-password" value={repeat} onValueChange={setRepeat} required />
      </FormGroup>
      <Button type="submit" intent={Intent.PRIMARY} fill loading={pending} text={submitText} />
    </form>
  );
}
