import { makeStyles, tokens } from '@fluentui/react-components';
import type { AuditEntry } from '../../reviews/api/review-schemas';
import { formatDateTime } from '../../users/utils/format-date-time';

export interface SignOffBlockProps {
  revision: number;
  signOff: AuditEntry | null;
}

const useStyles = makeStyles({
  notApproved: {
    border: '4px solid #b91c1c',
    color: '#b91c1c',
    padding: tokens.spacingVerticalM,
    fontSize: tokens.fontSizeBase600,
    fontWeight: tokens.fontWeightBold,
    textAlign: 'center',
  },
  block: {
    border: `2px solid #111827`,
    padding: tokens.spacingVerticalS,
    display: 'grid',
    gridTemplateColumns: 'repeat(3, 1fr)',
    gap: tokens.spacingHorizontalM,
  },
  label: { display: 'block', fontSize: tokens.fontSizeBase200, textTransform: 'uppercase', letterSpacing: '0.04em' },
  value: { display: 'block', fontWeight: tokens.fontWeightSemibold, minHeight: '1.4em', borderBottom: '1px solid #6b7280' },
});

/** The reviewer's sign-off of this revision, with blanks for the shop floor — or a refusal to build. */
export function SignOffBlock({ revision, signOff }: SignOffBlockProps) {
  const styles = useStyles();
  if (!signOff) {
    return (
      <div className={styles.notApproved} role="alert" data-sheet-section>
        ⛔ NOT APPROVED — do not build. Revision {revision} has no reviewer sign-off.
      </div>
    );
  }
  const fields: Array<[string, string]> = [
    ['Approved by (reviewer)', signOff.actor?.displayName ?? '—'],
    ['Approved on', formatDateTime(signOff.at)],
    ['Revision', String(revision)],
    ['Built by', ''],
    ['Leak-tested at working pressure by', ''],
    ['Date', ''],
  ];
  return (
    <section className={styles.block} aria-label="Sign-off" data-sheet-section>
      {fields.map(([label, value]) => (
        <div key={label}>
          <span className={styles.label}>{label}</span>
          <span className={styles.value}>{value}</span>
        </div>
      ))}
    </section>
  );
}
