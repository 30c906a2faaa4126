import { Text } from '@fluentui/react-components';
import { useEditor } from '../../hooks/editor-context';
import { useEditorState } from '../../hooks/useEditorState';
import { LineInspector } from './LineInspector';
import { UnitInspector } from './UnitInspector';
import { ZoneInspector } from './ZoneInspector';

/** The right panel: the fields of whatever is selected (the first item of a multiple selection). */
export function Inspector() {
  const { store } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const selection = useEditorState(store, (s) => s.selection);
  const first = selection[0];
  let body = <Text size={200}>Select a unit, port, line or heat zone to edit it.</Text>;
  if (selection.length > 1 && selection.every((s) => s.kind !== 'corner')) {
    body = <Text size={200}>{selection.length} items selected: drag to move, Delete removes, Ctrl+D duplicates.</Text>;
  } else if (first?.kind === 'unit' || first?.kind === 'port') {
    const unitId = first.kind === 'unit' ? first.id : first.unitId;
    const unit = doc.units.find((u) => u.id === unitId);
    if (unit) body = <UnitInspector key={unit.id} unit={unit} highlightedPortId={first.kind === 'port' ? first.id : null} />;
  } else if (first?.kind === 'line' || first?.kind === 'corner') {
    const lineId = first.kind === 'line' ? first.id : first.lineId;
    const line = doc.lines.find((l) => l.id === lineId);
    const corner = selection.find((s) => s.kind === 'corner');
    if (line) body = <LineInspector key={line.id} doc={doc} line={line} selectedCorner={corner?.kind === 'corner' ? corner.index : null} />;
  } else if (first?.kind === 'zone') {
    const zone = doc.heatZones.find((z) => z.id === first.id);
    if (zone) body = <ZoneInspector key={zone.id} zone={zone} />;
  }
  return (
    <section aria-labelledby="sketch-inspector-title">
      <Text as="h2" id="sketch-inspector-title" weight="semibold" size={300}>
        Inspector
      </Text>
      {body}
    </section>
  );
}
