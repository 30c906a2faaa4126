import { makeStyles, tokens } from '@fluentui/react-components';

export interface WordmarkProps {
  size?: 'medium' | 'large';
}

const useStyles = makeStyles({
  root: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalS, color: 'inherit' },
  name: { fontWeight: tokens.fontWeightSemibold, letterSpacing: '0.02em' },
  medium: { fontSize: tokens.fontSizeBase400 },
  large: { fontSize: tokens.fontSizeHero700 },
});

/** Linesmith's mark: one line bent between two ports, on the brand colour. */
export function Wordmark({ size = 'medium' }: WordmarkProps) {
  const styles = useStyles();
  const px = size === 'large' ? 40 : 28;
  return (
    <span className={styles.root}>
      <svg width={px} height={px} viewBox="0 0 32 32" aria-hidden="true" focusable="false">
        <rect width="32" height="32" rx="7" fill={tokens.colorBrandBackground} />
        <path
          d="M8 24 V15 a5 5 0 0 1 5 -5 H24"
          fill="none"
          stroke={tokens.colorNeutralForegroundOnBrand}
          strokeWidth="3"
          strokeLinecap="round"
        />
        <circle cx="8" cy="24" r="3" fill={tokens.colorNeutralForegroundOnBrand} />
        <circle cx="24" cy="10" r="3" fill={tokens.colorNeutralForegroundOnBrand} />
      </svg>
      <span className={`${styles.name} ${size === 'large' ? styles.large : styles.medium}`}>Linesmith</span>
    </span>
  );
}
