import { Divider, Text, makeStyles, tokens } from '@fluentui/react-components';
import { Link } from 'react-router-dom';
import { useSession } from '../../auth/hooks/useSession';
import { UnitsMenu } from '../../preferences/components/UnitsMenu';
import { ThemeToggle } from './ThemeToggle';
import { UserMenu } from './UserMenu';
import { Wordmark } from './Wordmark';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  home: {
    color: tokens.colorNeutralForeground1,
    textDecorationLine: 'none',
    borderRadius: tokens.borderRadiusMedium,
    ':focus-visible': { outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}` },
  },
  divider: { flexGrow: 0, height: '20px' },
  spacer: { flexGrow: 1 },
});

export function TopBar() {
  const styles = useStyles();
  const { me } = useSession();
  return (
    <header className={styles.bar}>
      <Link to="/" className={styles.home} aria-label="Linesmith home">
        <Wordmark />
      </Link>
      {me && (
        <>
          <Divider vertical className={styles.divider} />
          <Text weight="medium">{me.shop.name}</Text>
        </>
      )}
      <span className={styles.spacer} />
      <UnitsMenu />
      <ThemeToggle />
      <UserMenu />
    </header>
  );
}
