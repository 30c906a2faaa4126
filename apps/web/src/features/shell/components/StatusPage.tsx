import { Text, makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

export interface StatusPageProps {
  icon: ReactNode;
  title: string;
  children: ReactNode;
  actions?: ReactNode;
}

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-start',
    gap: tokens.spacingVerticalM,
    maxWidth: '560px',
    padding: `${tokens.spacingVerticalXXL} 0`,
  },
  icon: { fontSize: '40px', color: tokens.colorBrandForeground1, display: 'flex' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

/** Shared layout of the not-found, no-access and error pages. */
export function StatusPage({ icon, title, children, actions }: StatusPageProps) {
  const styles = useStyles();
  return (
    <section className={styles.root} aria-labelledby="status-page-title">
      <span className={styles.icon} aria-hidden="true">
        {icon}
      </span>
      <Text as="h1" id="status-page-title" size={600} weight="semibold">
        {title}
      </Text>
      <Text as="p">{children}</Text>
      {actions && <div className={styles.actions}>{actions}</div>}
    </section>
  );
}
