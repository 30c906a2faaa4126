import { MessageBar, MessageBarBody, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

export interface SectionIntroProps {
  title: string;
  /** What the section is for, in the shop's words. */
  purpose: ReactNode;
  /** Set while the section's server side is not part of this version. */
  notAvailableYet?: boolean;
  children?: ReactNode;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, maxWidth: '760px' },
});

export function SectionIntro({ title, purpose, notAvailableYet = false, children }: SectionIntroProps) {
  const styles = useStyles();
  return (
    <section className={styles.root} aria-labelledby="section-title">
      <Text as="h1" id="section-title" size={700} weight="semibold">
        {title}
      </Text>
      <Text as="p">{purpose}</Text>
      {notAvailableYet && (
        <MessageBar intent="info">
          <MessageBarBody>This section is not available yet in this version of Linesmith.</MessageBarBody>
        </MessageBar>
      )}
      {children}
    </section>
  );
}
