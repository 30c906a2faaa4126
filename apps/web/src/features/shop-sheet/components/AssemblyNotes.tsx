import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { hoseAssemblyNotes, type FamilyNotes } from '../utils/assembly-notes';

export interface AssemblyNotesProps {
  families: readonly FamilyNotes[];
}

const useStyles = makeStyles({ list: { margin: `${tokens.spacingVerticalXS} 0`, paddingLeft: tokens.spacingHorizontalXL } });

/** Assembly notes for every connection family on the circuit, then the notes for every hose. */
export function AssemblyNotes({ families }: AssemblyNotesProps) {
  const styles = useStyles();
  return (
    <section aria-labelledby="assembly-notes-title" data-sheet-break>
      <Text as="h2" id="assembly-notes-title" size={500} weight="semibold">
        Assembly notes
      </Text>
      {families.map(({ family, label, notes }) => (
        <section key={family} aria-label={`Assembly notes: ${label}`}>
          <Text as="h3" size={400} weight="semibold">
            {label}
          </Text>
          <ul className={styles.list}>
            {notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </section>
      ))}
      <section aria-label="Assembly notes: every hose">
        <Text as="h3" size={400} weight="semibold">
          Every hose
        </Text>
        <ul className={styles.list}>
          {hoseAssemblyNotes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </section>
    </section>
  );
}
