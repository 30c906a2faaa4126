import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';

export interface PageTrailProps {
  /** Ancestors with their links, then the current page without one. */
  steps: ReadonlyArray<{ label: string; to?: string }>;
}

const useStyles = makeStyles({
  trail: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXS, color: tokens.colorNeutralForeground3 },
  link: { color: tokens.colorBrandForegroundLink },
});

/** Where this page sits: Builds › build › circuit. */
export function PageTrail({ steps }: PageTrailProps) {
  const styles = useStyles();
  return (
    <nav aria-label="Breadcrumb">
      <Text size={200} className={styles.trail}>
        {steps.map((step, index) => (
          <Fragment key={`${index}-${step.label}`}>
            {index > 0 && <span aria-hidden="true">›</span>}
            {step.to ? (
              <Link className={styles.link} to={step.to}>
                {step.label}
              </Link>
            ) : (
              <span aria-current="page">{step.label}</span>
            )}
          </Fragment>
        ))}
      </Text>
    </nav>
  );
}
