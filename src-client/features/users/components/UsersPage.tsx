import { useCallback, useMemo, useState } from 'react';
import { Button, HTMLSelect, Intent, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { Cell, Column, Table } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { useSession, type Role } from '../../../lib/session';
import { useUsers } from '../api/get-users';
import { useChangeUserRole } from '../api/change-user-role';
import { useSetUserActive } from '../api/set-user-active';
import type { UserRow } from '../types';
import { InviteUserDialog } from './InviteUserDialog';
import { ROLE_OPTIONS } from './role-options';

const STATUS_INTENT: Record<UserRow['status'], Intent> = { active: Intent.SUCCESS, invited: Intent.PRIMARY, deactivated: Intent.NONE };
const toaster = OverlayToaster.createAsync({ position: Position.TOP });

const showError = (error: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: error.message }));

export function UsersPage() {
  const { user: me } = useSession();
  const users = useUsers();
  const changeRole = useChangeUserRole();
  const setActive = useSetUserActive();
  const [inviting, setInviting] = useState(false);
  const rows = useMemo(() => users.data ?? [], [users.data]);

  const getCellData = useCallback((row: number, column: keyof UserRow) => String(rows[row]?.[column] ?? ''), [rows]);

  const textCell = useCallback((column: keyof UserRow) => (row: number) => <Cell>{getCellData(row, column)}</Cell>, [getCellData]);

  const roleCell = useCallback(
    (row: number) => {
      const u = rows[row];
      return (
        <Cell interactive>
          <HTMLSelect
            minimal
            aria-label={`Role of ${u.email}`}
            value={u.role}
            disabled={u.id === me?.id}
            options={ROLE_OPTIONS}
            onChange={(e) => changeRole.mutate({ id: u.id, role: e.currentTarget.value as Role }, { onError: showError })}
          />
        </Cell>
      );
    },
    [rows, me?.id, changeRole],
  );

  const statusCell = useCallback(
    (row: number) => (
      <Cell>
        <Tag minimal intent={STATUS_INTENT[rows[row].status]}>
          {rows[row].status}
        </Tag>
      </Cell>
    ),
    [rows],
  );

  const actionCell = useCallback(
    (row: number) => {
      const u = rows[row];
      if (u.id === me?.id) return <Cell />;
      const deactivated = u.status === 'deactivated';
      return (
        <Cell interactive>
          <Button
            size="small"
            variant="minimal"
            intent={deactivated ? Intent.SUCCESS : Intent.DANGER}
            text={deactivated ? 'Reactivate' : 'Deactivate'}
            aria-label={`${deactivated ? 'Reactivate' : 'Deactivate'} ${u.email}`}
            onClick={() => setActive.mutate({ id: u.id, active: deactivated }, { onError: showError })}
          />
        </Cell>
      );
    },
    [rows, me?.id, setActive],
  );

  return (
    <>
      <PageHeader
        title="Users"
        subtitle="Who may sign in, and with which role. Role changes and deactivation end the user's current sessions."
        actions={<Button icon="new-person" intent={Intent.PRIMARY} text="Invite user" onClick={() => setInviting(true)} />}
      />
      <QueryState isPending={users.isPending} error={users.error}>
        <div className="bw-table-wrap" data-testid="users-table">
          <Table
            numRows={rows.length}
            defaultRowHeight={34}
            columnWidths={[200, 280, 160, 130, 140]}
            getCellClipboardData={(r, c) => getCellData(r, (['name', 'email', 'role', 'status', 'id'] as const)[c])}
          >
            <Column id="name" name="Name" cellRenderer={textCell('name')} />
            <Column id="email" name="E-mail" cellRenderer={textCell('email')} />
            <Column id="role" name="Role" cellRenderer={roleCell} />
            <Column id="status" name="Status" cellRenderer={statusCell} />
            <Column id="actions" name="" cellRenderer={actionCell} />
          </Table>
        </div>
      </QueryState>
      <InviteUserDialog
        isOpen={inviting}
        onClose={() => setInviting(false)}
        onInvited={(email) => toaster.then((t) => t.show({ intent: Intent.SUCCESS, message: `Invitation sent to ${email}` }))}
      />
    </>
  );
}
