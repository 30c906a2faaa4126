import {
  Badge,
  Button,
  Table,
  TableBody,
  TableCell,
  TableCellLayout,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { EditRegular, PersonAvailableRegular, PersonProhibitedRegular } from '@fluentui/react-icons';
import { roleLabels } from '../../auth/utils/role-labels';
import type { User } from '../api/user-schema';
import { formatDateTime } from '../utils/format-date-time';

export interface UsersTableProps {
  users: readonly User[];
  currentUserId: string | undefined;
  onEdit(user: User): void;
  onSetActive(user: User): void;
}

const useStyles = makeStyles({
  roles: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXS },
  actions: { display: 'flex', gap: tokens.spacingHorizontalXS },
  inactive: { color: tokens.colorNeutralForeground3 },
  srOnly: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
  },
});

export function UsersTable({ users, currentUserId, onEdit, onSetActive }: UsersTableProps) {
  const styles = useStyles();
  return (
    <Table size="small" aria-label="Users">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Name</TableHeaderCell>
          <TableHeaderCell>E-mail</TableHeaderCell>
          <TableHeaderCell>Roles</TableHeaderCell>
          <TableHeaderCell>Status</TableHeaderCell>
          <TableHeaderCell>Last changed</TableHeaderCell>
          <TableHeaderCell>
            <span className={styles.srOnly}>Actions</span>
          </TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {users.map((user) => {
          const isSelf = user.id === currentUserId;
          return (
            <TableRow key={user.id} className={user.active ? undefined : styles.inactive}>
              <TableCell>
                <TableCellLayout>{user.displayName}</TableCellLayout>
              </TableCell>
              <TableCell>{user.email}</TableCell>
              <TableCell>
                <span className={styles.roles}>
                  {user.roles.map((role) => (
                    <Badge key={role} appearance="tint" color="brand">
                      {roleLabels[role]}
                    </Badge>
                  ))}
                </span>
              </TableCell>
              <TableCell>
                <Badge appearance="outline" color={user.active ? 'success' : 'subtle'}>
                  {user.active ? 'Active' : 'Inactive'}
                </Badge>
              </TableCell>
              <TableCell>{formatDateTime(user.updatedAt)}</TableCell>
              <TableCell>
                <span className={styles.actions}>
                  <Button
                    size="small"
                    appearance="subtle"
                    icon={<EditRegular />}
                    aria-label={`Edit ${user.displayName}`}
                    onClick={() => onEdit(user)}
                  >
                    Edit
                  </Button>
                  {/* Admins cannot deactivate themselves (API contract), so the button is not offered. */}
                  {!isSelf && (
                    <Button
                      size="small"
                      appearance="subtle"
                      icon={user.active ? <PersonProhibitedRegular /> : <PersonAvailableRegular />}
                      aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.displayName}`}
                      onClick={() => onSetActive(user)}
                    >
                      {user.active ? 'Deactivate' : 'Reactivate'}
                    </Button>
                  )}
                </span>
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
