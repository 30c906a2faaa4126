import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { NavLink } from 'react-router-dom';
import { useVisibleNavItems } from '../hooks/useVisibleNavItems';

const useStyles = makeStyles({
  nav: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalS}`,
    borderRight: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground2,
    minWidth: '180px',
  },
  list: { listStyleType: 'none', margin: 0, padding: 0, display: 'contents' },
  link: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground2,
    textDecorationLine: 'none',
    fontSize: tokens.fontSizeBase300,
    ':hover': { backgroundColor: tokens.colorNeutralBackground2Hover, color: tokens.colorNeutralForeground2Hover },
    ':focus-visible': { outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  active: {
    backgroundColor: tokens.colorBrandBackground2,
    color: tokens.colorBrandForeground2,
    fontWeight: tokens.fontWeightSemibold,
    ':hover': { backgroundColor: tokens.colorBrandBackground2Hover, color: tokens.colorBrandForeground2 },
  },
  icon: { fontSize: '20px', flexShrink: 0 },
});

/** Sections the user's roles open; the current one is highlighted and marked `aria-current`. */
export function SideNav() {
  const styles = useStyles();
  const items = useVisibleNavItems();
  return (
    <nav aria-label="Sections" className={styles.nav}>
      <ul className={styles.list}>
        {items.map(({ section, to, label, icon: Icon }) => (
          <li key={section}>
            <NavLink to={to} className={({ isActive }) => mergeClasses(styles.link, isActive && styles.active)}>
              <Icon className={styles.icon} aria-hidden="true" />
              <span>{label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
