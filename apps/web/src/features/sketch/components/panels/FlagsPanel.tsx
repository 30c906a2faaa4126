import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { SEVERITY_ORDER, type Flag, type Severity } from '@linesmith/routing';
import { useEditor } from '../../hooks/editor-context';
import { useEditorState } from '../../hooks/useEditorState';
import { flagItem, flagPosition } from '../../utils/flag-target';
import { severityStyle } from '../shapes/FlagMarker';

const useStyles = makeStyles({
  group: { margin: `${tokens.spacingVerticalXS} 0`, padding: 0, listStyle: 'none' },
  flag: {
    display: 'block',
    width: '100%',
    textAlign: 'left',
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    background: tokens.colorNeutralBackground1,
    padding: tokens.spacingVerticalXS,
    marginBottom: tokens.spacingVerticalXXS,
    cursor: 'pointer',
    font: 'inherit',
    color: 'inherit',
  },
  fix: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
});

const severities = (Object.keys(SEVERITY_ORDER) as Severity[]).sort((a, b) => SEVERITY_ORDER[a] - SEVERITY_ORDER[b]);
const groupTitle: Record<Severity, string> = { blocker: 'Blockers', caution: 'Cautions', note: 'Notes' };

/** The live flags, grouped by severity; clicking one selects its item and brings it into view. */
export function FlagsPanel() {
  const styles = useStyles();
  const { store, evaluation, focusOn } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const open = (flag: Flag) => {
    const item = flagItem(flag);
    if (item) store.select([item]);
    const at = flagPosition(doc, flag);
    if (at) focusOn(at);
  };
  return (
    <section aria-labelledby="sketch-flags-title">
      <Text as="h2" id="sketch-flags-title" weight="semibold" size={300}>
        Flags ({evaluation.flags.length})
      </Text>
      {evaluation.flags.length === 0 && <Text block>No flags: every rule passes for this sketch.</Text>}
      {severities.map((severity) => {
        const flags = evaluation.flags.filter((f) => f.severity === severity);
        if (flags.length === 0) return null;
        const style = severityStyle[severity];
        return (
          <div key={severity}>
            <Text as="h3" weight="semibold" size={200}>
              {style.icon} {groupTitle[severity]} ({flags.length})
            </Text>
            <ul className={styles.group} aria-label={groupTitle[severity]}>
              {flags.map((flag, i) => (
                <li key={`${flag.code}:${i}`}>
                  <button type="button" className={styles.flag} onClick={() => open(flag)} data-flag-code={flag.code}>
                    <span>
                      {style.icon} <strong>{style.word}</strong> · <code>{flag.code}</code>
                    </span>
                    <br />
                    <span>{flag.message}</span>
                    <br />
                    <span className={styles.fix}>Fix: {flag.fix}</span>
                  </button>
                </li>
              ))}
            </ul>
          </div>
        );
      })}
    </section>
  );
}
