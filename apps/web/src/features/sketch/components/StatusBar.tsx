import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { useEditor } from '../hooks/editor-context';
import { useEditorState } from '../hooks/useEditorState';
import { scaleLabel } from '../model/geometry/calibration';
import { tools } from '../model/tools';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    gap: tokens.spacingHorizontalL,
    padding: `2px ${tokens.spacingHorizontalS}`,
    borderTop: `1px solid ${tokens.colorNeutralStroke2}`,
    fontSize: tokens.fontSizeBase200,
  },
});

/** Scale, zoom and what the current tool expects next. */
export function StatusBar() {
  const styles = useStyles();
  const { store, lengthUnit } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const tool = useEditorState(store, (s) => s.tool);
  const zoom = useEditorState(store, (s) => s.view.zoom);
  return (
    <div className={styles.bar} role="status" aria-label="Sketch status">
      <Text size={200}>{scaleLabel(doc, lengthUnit)}</Text>
      <Text size={200}>Zoom {Math.round(zoom * 100)} %</Text>
      <Text size={200}>{tools.find((t) => t.id === tool)?.hint}</Text>
    </div>
  );
}
