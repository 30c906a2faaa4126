import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular, MailRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import type { Role } from '../../../lib/contract/role-schema';
import { useDebouncedValue } from '../../../lib/useDebouncedValue';
import { useSession } from '../../auth/hooks/useSession';
import { defaultUserListFilters } from '../api/user-list-filters';
import type { User } from '../api/user-schema';
import { useUsersList } from '../hooks/useUsersList';
import { CreateUserDialog } from './CreateUserDialog';
import { EditUserDialog } from './EditUserDialog';
import { InviteUserDialog } from './InviteUserDialog';
import { SetActiveDialog } from './SetActiveDialog';
import { UsersTable } from './UsersTable';
import { UsersToolbar } from './UsersToolbar';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM },
  pager: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

/** Admin › Users: who may sign in to this shop, and with which roles. */
export function UsersPage() {
  const styles = useStyles();
  const { me } = useSession();
  const [search, setSearch] = useState('');
  const [role, setRole] = useState<Role | null>(null);
  const [showInactive, setShowInactive] = useState(false);
  const [page, setPage] = useState(1);
  const [creating, setCreating] = useState(false);
  const [inviting, setInviting] = useState(false);
  const [editing, setEditing] = useState<User | null>(null);
  const [settingActive, setSettingActive] = useState<User | null>(null);
  const debouncedSearch = useDebouncedValue(search);

  const filters = { ...defaultUserListFilters, search: debouncedSearch, role, showInactive, page };
  const { data, isPending, isError, error, refetch, isFetching } = useUsersList(filters);
  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const filtered = debouncedSearch.trim() !== '' || role !== null;

  return (
    <section className={styles.page} aria-labelledby="users-title">
      <div className={styles.header}>
        <Text as="h1" id="users-title" size={700} weight="semibold">
          Users and roles
        </Text>
        <div className={styles.pager}>
          <Button icon={<MailRegular />} onClick={() => setInviting(true)}>
            Invite user
          </Button>
          <Button appearance="primary" icon={<AddRegular />} onClick={() => setCreating(true)}>
            New user
          </Button>
        </div>
      </div>

      <UsersToolbar
        search={search}
        onSearchChange={(value) => {
          setSearch(value);
          setPage(1);
        }}
        role={role}
        onRoleChange={(value) => {
          setRole(value);
          setPage(1);
        }}
        showInactive={showInactive}
        onShowInactiveChange={(value) => {
          setShowInactive(value);
          setPage(1);
        }}
      />

      {isPending && <Spinner label="Loading users…" />}
      {isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The users could not be loaded: {error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {data && data.items.length === 0 && (
        <Text as="p">
          {filtered ? 'No users match these filters.' : 'No users yet. Add the people of your shop with "New user".'}
        </Text>
      )}
      {data && data.items.length > 0 && (
        <>
          <UsersTable
            users={data.items}
            currentUserId={me?.id}
            onEdit={setEditing}
            onSetActive={setSettingActive}
          />
          <div className={styles.pager}>
            <Text size={200} aria-live="polite">
              {data.total} {data.total === 1 ? 'user' : 'users'} · page {data.page} of {pageCount}
              {isFetching ? ' · updating…' : ''}
            </Text>
            {pageCount > 1 && (
              <>
                <Button size="small" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
                  Previous
                </Button>
                <Button size="small" disabled={page >= pageCount} onClick={() => setPage((p) => p + 1)}>
                  Next
                </Button>
              </>
            )}
          </div>
        </>
      )}

      <CreateUserDialog open={creating} onClose={() => setCreating(false)} />
      {inviting && <InviteUserDialog onClose={() => setInviting(false)} />}
      {editing && <EditUserDialog key={editing.id} user={editing} onClose={() => setEditing(null)} />}
      {settingActive && (
        <SetActiveDialog key={settingActive.id} user={settingActive} onClose={() => setSettingActive(null)} />
      )}
    </section>
  );
}
