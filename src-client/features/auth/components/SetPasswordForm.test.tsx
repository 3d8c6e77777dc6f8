import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { BlueprintProvider } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { SetPasswordForm } from './SetPasswordForm';

const renderForm = (props: Partial<Parameters<typeof SetPasswordForm>[0]> = {}) => {
  const onSubmit = vi.fn();
  render(
    <BlueprintProvider>
      <SetPasswordForm submitText="Save" pending={false} error={null} onSubmit={onSubmit} {...props} />
    </BlueprintProvider>,
  );
  const fill = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
  return { onSubmit, fill, submit: () => fireEvent.click(screen.getByRole('button', { name: 'Save' })) };
};

describe(SetPasswordForm.name, () => {
  it('refuses a password shorter than 10 characters without calling the server', () => {
    const { onSubmit, fill, submit } = renderForm();
    fill('New password', 'short');
    fill('Repeat the password', 'short');
    submit();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('refuses two different passwords and says so', () => {
    const { onSubmit, fill, submit } = renderForm();
    fill('New password', 'long-enough-password');
    fill('Repeat the password', 'long-enough-passw0rd');
    submit();
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByText('The two passwords differ')).toBeTruthy();
  });

  it('submits the password, and the name only when one was entered', () => {
    const { onSubmit, fill, submit } = renderForm({ askName: true });
    fill('New password', 'long-enough-password');
    fill('Repeat the password', 'long-enough-password');
    submit();
    expect(onSubmit).toHaveBeenCalledWith({ password: 'long-enough-password' });
    fill('Your name', 'Nia');
    submit();
    expect(onSubmit).toHaveBeenLastCalledWith({ password: 'long-enough-password', name: 'Nia' });
  });

  it("shows the server's field message for the password", () => {
    const error = new ApiError(400, 'VALIDATION_FAILED', 'password: too weak', {
      fields: [{ field: 'password', message: 'must be longer than or equal to 10 characters' }],
    });
    renderForm({ error });
    expect(screen.getByRole('alert').textContent).toContain('Password must be longer than or equal to 10 characters');
  });
});
