import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { CheckmarkCircleFilled, ErrorCircleFilled, InfoFilled, WarningFilled, type FluentIcon } from '@fluentui/react-icons';
import type { Severity } from '@linesmith/routing';

/** A flag's severity, or `ok` for a check that passed. */
export type SeverityLevel = Severity | 'ok';

export interface SeverityLabelProps {
  level: SeverityLevel;
  /** Replaces the default word ("Blocker", "Caution", "Note", "OK"). */
  text?: string;
}

const looks: Record<SeverityLevel, { icon: FluentIcon; word: string }> = {
  blocker: { icon: ErrorCircleFilled, word: 'Blocker' },
  caution: { icon: WarningFilled, word: 'Caution' },
  note: { icon: InfoFilled, word: 'Note' },
  ok: { icon: CheckmarkCircleFilled, word: 'OK' },
};

const useStyles = makeStyles({
  root: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    fontWeight: tokens.fontWeightSemibold,
    whiteSpace: 'nowrap',
  },
  icon: { fontSize: '16px', flexShrink: 0 },
  blocker: { color: tokens.colorPaletteRedForeground1 },
  caution: { color: tokens.colorPaletteDarkOrangeForeground1 },
  note: { color: tokens.colorBrandForeground1 },
  ok: { color: tokens.colorPaletteGreenForeground1 },
});

/** Severity by icon and word as well as colour, so it reads in grey print and for colour-blind users. */
export function SeverityLabel({ level, text }: SeverityLabelProps) {
  const styles = useStyles();
  const { icon: Icon, word } = looks[level];
  return (
    <span className={mergeClasses(styles.root, styles[level])} data-severity={level}>
      <Icon className={styles.icon} aria-hidden="true" />
      <span>{text ?? word}</span>
    </span>
  );
}
