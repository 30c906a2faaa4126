import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { NavLink, Outlet } from 'react-router-dom';
import { adminPages } from '../utils/admin-pages';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  nav: { borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}` },
  list: { display: 'flex', gap: tokens.spacingHorizontalXS, listStyleType: 'none', margin: 0, padding: 0 },
  link: {
    display: 'block',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    color: tokens.colorNeutralForeground2,
    textDecorationLine: 'none',
    borderBottom: `${tokens.strokeWidthThicker} solid transparent`,
    ':hover': { color: tokens.colorNeutralForeground2Hover, backgroundColor: tokens.colorNeutralBackground1Hover },
    ':focus-visible': { outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  active: {
    color: tokens.colorBrandForeground1,
    fontWeight: tokens.fontWeightSemibold,
    borderBottomColor: tokens.colorBrandStroke1,
  },
});

/** Admin › Users, Admin › Shop rules: the section's own page links above the page. */
export function AdminSection() {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <nav aria-label="Admin pages" className={styles.nav}>
        <ul className={styles.list}>
          {adminPages.map((page) => (
            <li key={page.to}>
              <NavLink to={page.to} className={({ isActive }) => mergeClasses(styles.link, isActive && styles.active)}>
                {page.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <Outlet />
    </div>
  );
}
