import { Card, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { Wordmark } from '../../shell/components/Wordmark';

const useStyles = makeStyles({
  page: {
    flexGrow: 1,
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  card: { width: '100%', maxWidth: '380px', padding: tokens.spacingHorizontalXXL, gap: tokens.spacingVerticalL },
  header: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
});

/** The frame of the public account pages (invitation, password reset), like the sign-in page. */
export function AccountCard({ title, intro, children }: { title: string; intro: string; children: ReactNode }) {
  const styles = useStyles();
  return (
    <main className={styles.page}>
      <Card className={styles.card}>
        <div className={styles.header}>
          <Wordmark size="large" />
          <Text as="h1" size={500} weight="semibold">
            {title}
          </Text>
          <Text size={200}>{intro}</Text>
        </div>
        {children}
      </Card>
    </main>
  );
}
