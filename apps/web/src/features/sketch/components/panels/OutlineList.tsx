import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { portPosition } from '@linesmith/routing';
import { useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { useEditor } from '../../hooks/editor-context';
import { useEditorState } from '../../hooks/useEditorState';
import { routePx } from '../../model/geometry/line-route';
import { isSelected, type SelectedItem } from '../../model/selection';
import type { Point } from '../../model/tools';

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, maxHeight: '320px', overflowY: 'auto', outline: 'none' },
  option: { padding: '2px 6px', cursor: 'pointer', borderRadius: tokens.borderRadiusSmall, fontSize: tokens.fontSizeBase200 },
  active: { outline: `2px solid ${tokens.colorBrandStroke1}` },
  selected: { background: tokens.colorBrandBackground2 },
  port: { paddingLeft: '20px' },
});

interface Entry {
  key: string;
  label: string;
  item: SelectedItem;
  at: Point | null;
  indent?: boolean;
}

/** Every unit, port, line and heat zone as a list: arrow keys move, Enter selects and shows the item. */
export function OutlineList() {
  const styles = useStyles();
  const { store, focusOn } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const selection = useEditorState(store, (s) => s.selection);
  const [active, setActive] = useState(0);
  const listRef = useRef<HTMLUListElement>(null);

  const entries = useMemo<Entry[]>(() => {
    const unitName = (id: string) => doc.units.find((u) => u.id === id)?.label || 'unit';
    const portName = (unitId: string, portId: string) =>
      doc.units.find((u) => u.id === unitId)?.ports.find((p) => p.id === portId)?.label || 'port';
    return [
      ...doc.units.flatMap((unit) => [
        { key: unit.id, label: `Unit: ${unit.label || unit.kind}`, item: { kind: 'unit' as const, id: unit.id }, at: { x: unit.x, y: unit.y } },
        ...unit.ports.map((port) => ({
          key: `${unit.id}/${port.id}`,
          label: `Port: ${port.label || port.id} (${port.connection.size} ${port.connection.family})`,
          item: { kind: 'port' as const, unitId: unit.id, id: port.id },
          at: portPosition(unit, port),
          indent: true,
        })),
      ]),
      ...doc.lines.map((line, i) => ({
        key: line.id,
        label: `Line ${i + 1}: ${unitName(line.from.unitId)} ${portName(line.from.unitId, line.from.portId)} → ${unitName(line.to.unitId)} ${portName(line.to.unitId, line.to.portId)}`,
        item: { kind: 'line' as const, id: line.id },
        at: routePx(doc, line)?.[0] ?? null,
      })),
      ...doc.heatZones.map((zone) => ({
        key: zone.id,
        label: `Heat zone: ${zone.label || zone.kind}`,
        item: { kind: 'zone' as const, id: zone.id },
        at: zone.polygon[0],
      })),
    ];
  }, [doc]);

  const choose = (entry: Entry) => {
    store.select([entry.item]);
    if (entry.at) focusOn(entry.at);
  };
  const onKeyDown = (e: KeyboardEvent) => {
    if (entries.length === 0) return;
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      setActive((a) => Math.max(0, Math.min(entries.length - 1, a + (e.key === 'ArrowDown' ? 1 : -1))));
    } else if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      const entry = entries[Math.min(active, entries.length - 1)];
      if (entry) choose(entry);
    }
  };
  const current = entries[Math.min(active, entries.length - 1)];

  return (
    <section aria-labelledby="sketch-outline-title">
      <Text as="h2" id="sketch-outline-title" weight="semibold" size={300}>
        Outline
      </Text>
      {entries.length === 0 && <Text block size={200}>Nothing on the sketch yet.</Text>}
      <ul
        ref={listRef}
        role="listbox"
        aria-label="Sketch items"
        tabIndex={0}
        className={styles.list}
        onKeyDown={onKeyDown}
        aria-activedescendant={current ? `outline-${current.key}` : undefined}
      >
        {entries.map((entry, i) => (
          <li
            key={entry.key}
            id={`outline-${entry.key}`}
            role="option"
            aria-selected={isSelected(selection, entry.item)}
            className={[
              styles.option,
              entry.indent ? styles.port : '',
              i === active ? styles.active : '',
              isSelected(selection, entry.item) ? styles.selected : '',
            ].join(' ')}
            onClick={() => {
              setActive(i);
              choose(entry);
            }}
          >
            {entry.label}
          </li>
        ))}
      </ul>
    </section>
  );
}
