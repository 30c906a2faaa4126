import { makeStyles, tokens } from '@fluentui/react-components';
import { Outlet } from 'react-router-dom';
import { SideNav } from './SideNav';
import { TopBar } from './TopBar';

const useStyles = makeStyles({
  shell: { flexGrow: 1, display: 'flex', flexDirection: 'column', minHeight: 0 },
  skip: {
    position: 'absolute',
    left: '-10000px',
    ':focus': { left: tokens.spacingHorizontalM, top: tokens.spacingVerticalM, zIndex: 1, padding: tokens.spacingHorizontalS, backgroundColor: tokens.colorNeutralBackground1 },
  },
  body: { flexGrow: 1, display: 'flex', minHeight: 0 },
  content: {
    flexGrow: 1,
    minWidth: 0,
    overflow: 'auto',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXL}`,
    ':focus': { outlineStyle: 'none' },
  },
});

export function AppShell() {
  const styles = useStyles();
  return (
    <div className={styles.shell}>
      <a href="#main-content" className={styles.skip}>
        Skip to content
      </a>
      <TopBar />
      <div className={styles.body}>
        <SideNav />
        <main id="main-content" tabIndex={-1} className={styles.content}>
          <Outlet />
        </main>
      </div>
    </div>
  );
}
