import { FormEvent, useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import type { Role } from '../../../lib/session';
import { useInviteUser } from '../api/invite-user';
import { ROLE_OPTIONS } from './role-options';

export interface InviteUserDialogProps {
  isOpen: boolean;
  onClose: () => void;
  onInvited: (email: string) => void;
}

export function InviteUserDialog({ isOpen, onClose, onInvited }: InviteUserDialogProps) {
  const invite = useInviteUser();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role>('engineer');
  const fieldErrors = invite.error instanceof ApiError ? invite.error.fieldErrors : {};

  const submit = (event: FormEvent) => {
    event.preventDefault();
    invite.mutate(
      { email, name, role },
      {
        onSuccess: () => {
          onInvited(email);
          setEmail('');
          setName('');
          invite.reset();
          onClose();
        },
      },
    );
  };

  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="Invite a user" icon="new-person">
      <form onSubmit={submit}>
        <DialogBody>
          {invite.error instanceof ApiError && !Object.keys(fieldErrors).length && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {invite.error.message}
            </Callout>
          )}
          <FormGroup label="E-mail" labelFor="invite-email" intent={fieldErrors.email ? Intent.DANGER : Intent.NONE} helperText={fieldErrors.email}>
            <InputGroup id="invite-email" type="email" value={email} onValueChange={setEmail} required />
          </FormGroup>
          <FormGroup label="Name" labelFor="invite-name" intent={fieldErrors.name ? Intent.DANGER : Intent.NONE} helperText={fieldErrors.name}>
            <InputGroup id="invite-name" value={name} onValueChange={setName} required maxLength={120} />
          </FormGroup>
          <FormGroup label="Role" labelFor="invite-role">
            <HTMLSelect id="invite-role" value={role} onChange={(e) => setRole(e.currentTarget.value as Role)} options={ROLE_OPTIONS} />
          </FormGroup>
          <p className="bw-muted">They get an e-mail with a link that sets their password. The link works once, for 72 hours.</p>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent={Intent.PRIMARY} loading={invite.isPending} text="Send invitation" />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
