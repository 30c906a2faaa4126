import { Button, Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import type { HoseEndPart, HosePart } from '@linesmith/catalog';
import type { CircuitLine, CircuitPort, LineEnd } from '@linesmith/routing';
import { useMemo } from 'react';
import { useEditor } from '../../hooks/editor-context';
import { setEndStack } from '../../model/commands/set-end-stack';
import { endStackSuggestions } from '../../utils/end-stack-suggestions';
import { hoseEndsForHose, partLabel } from '../../utils/part-filters';

export interface EndStackEditorProps {
  line: CircuitLine;
  end: LineEnd;
  port: CircuitPort | undefined;
  portName: string;
  hose: HosePart | undefined;
}

const useStyles = makeStyles({
  box: { display: 'grid', gap: tokens.spacingVerticalXXS },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalL, fontSize: tokens.fontSizeBase200 },
  suggestion: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'center', fontSize: tokens.fontSizeBase200 },
});

/** One end of a line: the parts from the port to the hose, the hose end picker, and the solver's suggestions. */
export function EndStackEditor({ line, end, port, portName, hose }: EndStackEditorProps) {
  const styles = useStyles();
  const { store, parts, partsById } = useEditor();
  const stack = line.endStacks[end];
  const hoseEnds = useMemo(() => hoseEndsForHose(parts, hose), [parts, hose]);
  const currentEnd = partsById.get(stack[stack.length - 1] ?? '');
  const chosenEnd = currentEnd?.kind === 'hose-end' ? currentEnd : undefined;
  const suggestions = useMemo(() => {
    if (!port) return [];
    const candidates: HoseEndPart[] = chosenEnd ? [chosenEnd] : hoseEnds;
    return endStackSuggestions(port, candidates, parts).slice(0, 6);
  }, [port, chosenEnd, hoseEnds, parts]);
  const set = (partIds: string[]) => store.run(setEndStack, { lineId: line.id, end, partIds });
  const title = `End stack at ${portName}`;
  return (
    <section className={styles.box} aria-label={title}>
      <Text weight="semibold" size={200}>
        {title}
        {port?.requirement ? ` — needs ${port.requirement.feature} (${port.requirement.reason})` : ''}
      </Text>
      {stack.length === 0 ? (
        <Text size={200}>Nothing yet: pick a suggestion below.</Text>
      ) : (
        <ol className={styles.list}>
          {stack.map((id, i) => (
            <li key={`${id}:${i}`}>{partLabel(partsById.get(id), id)}</li>
          ))}
        </ol>
      )}
      <Field label={`Hose end at ${portName}`} size="small">
        <Select
          size="small"
          value={chosenEnd?.id ?? ''}
          disabled={!hose}
          onChange={(_, d) => set(d.value ? [...stack.filter((id) => partsById.get(id)?.kind !== 'hose-end'), d.value] : stack.filter((id) => partsById.get(id)?.kind !== 'hose-end'))}
        >
          <option value="">{hose ? '— choose a hose end —' : 'Pick the hose first'}</option>
          {hoseEnds.map((p) => (
            <option key={p.id} value={p.id}>
              {p.description}
            </option>
          ))}
        </Select>
      </Field>
      {hose && suggestions.length === 0 && <Text size={200}>No adapters in the catalogue join this port to these hose ends.</Text>}
      {suggestions.length > 0 && (
        <ul className={styles.list} aria-label={`Suggestions for ${portName}`}>
          {suggestions.map((s) => (
            <li key={s.partIds.join('>')} className={styles.suggestion}>
              <Button size="small" onClick={() => set(s.partIds)} aria-label={`Use ${s.label} at ${portName}`}>
                Use
              </Button>
              <span>{s.label}</span>
            </li>
          ))}
        </ul>
      )}
      {stack.length > 0 && (
        <Button size="small" appearance="subtle" onClick={() => set([])}>
          Clear end stack
        </Button>
      )}
    </section>
  );
}
