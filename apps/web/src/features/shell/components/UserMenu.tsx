import {
  Button,
  Menu,
  MenuDivider,
  MenuGroup,
  MenuGroupHeader,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
  Text,
} from '@fluentui/react-components';
import { PersonCircleRegular, SignOutRegular } from '@fluentui/react-icons';
import { useSession } from '../../auth/hooks/useSession';
import { roleLabels } from '../../auth/utils/role-labels';

export function UserMenu() {
  const { me, signOut } = useSession();
  if (!me) return null;
  const roles = me.roles.map((role) => roleLabels[role]).join(', ');

  return (
    <Menu>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" icon={<PersonCircleRegular />} aria-label={`Account: ${me.displayName}`}>
          {me.displayName}
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuGroup>
            <MenuGroupHeader>{me.email}</MenuGroupHeader>
            <Text size={200} block style={{ padding: '0 12px 8px' }}>
              Roles: {roles}
            </Text>
          </MenuGroup>
          <MenuDivider />
          <MenuItem icon={<SignOutRegular />} // The session guard sends the signed-out user to the sign-in page.
            onClick={() => void signOut()}>
            Sign out
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
