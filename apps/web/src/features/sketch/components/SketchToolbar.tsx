import { Button, Checkbox, makeStyles, Select, Slider, Text, ToggleButton, Toolbar, ToolbarDivider, tokens } from '@fluentui/react-components';
import {
  ArrowRedoRegular,
  ArrowUndoRegular,
  ImageRegular,
  QuestionCircleRegular,
  ZoomFitRegular,
  ZoomInRegular,
  ZoomOutRegular,
} from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { useEditor } from '../hooks/editor-context';
import { useEditorState } from '../hooks/useEditorState';
import { setBackground } from '../model/commands/set-background';
import { canRedo, canUndo } from '../model/history';
import { tools } from '../model/tools';

export interface SketchToolbarProps {
  photos: ReadonlyArray<{ id: string; fileName: string }>;
  onFit(): void;
  onZoom(factor: number): void;
  onHelp(): void;
  onExportPng(): void;
  /** Save state and the save-version button, from the page that owns saving. */
  saveSlot?: ReactNode;
}

const useStyles = makeStyles({
  bar: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  background: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  slider: { width: '90px' },
  spacer: { flexGrow: 1 },
});

/** Tools with their keys, undo/redo, zoom, the background photo, export and help. */
export function SketchToolbar({ photos, onFit, onZoom, onHelp, onExportPng, saveSlot }: SketchToolbarProps) {
  const styles = useStyles();
  const { store } = useEditor();
  const tool = useEditorState(store, (s) => s.tool);
  const history = useEditorState(store, (s) => s.history);
  const background = history.doc.background;
  const setPhoto = (uploadId: string) =>
    store.run(setBackground, { background: uploadId ? { uploadId, opacity: background?.opacity ?? 0.7, locked: background?.locked ?? false } : null });
  return (
    <Toolbar aria-label="Sketch tools" className={styles.bar} size="small">
      {tools.map((t) => (
        <ToggleButton
          key={t.id}
          size="small"
          checked={tool === t.id}
          onClick={() => store.setTool(t.id)}
          title={`${t.hint} (${t.key})`}
          aria-keyshortcuts={t.key}
        >
          {t.label} ({t.key})
        </ToggleButton>
      ))}
      <ToolbarDivider />
      <Button size="small" icon={<ArrowUndoRegular />} disabled={!canUndo(history)} onClick={() => store.undo()} aria-label="Undo" title="Undo (Ctrl+Z)" />
      <Button size="small" icon={<ArrowRedoRegular />} disabled={!canRedo(history)} onClick={() => store.redo()} aria-label="Redo" title="Redo (Ctrl+Shift+Z)" />
      <Button size="small" icon={<ZoomOutRegular />} onClick={() => onZoom(1 / 1.25)} aria-label="Zoom out" title="Zoom out (−)" />
      <Button size="small" icon={<ZoomInRegular />} onClick={() => onZoom(1.25)} aria-label="Zoom in" title="Zoom in (+)" />
      <Button size="small" icon={<ZoomFitRegular />} onClick={onFit} aria-label="Fit to content" title="Fit (F)" />
      <ToolbarDivider />
      <div className={styles.background}>
        <ImageRegular aria-hidden />
        <Select
          size="small"
          aria-label="Background photo"
          value={background?.uploadId ?? ''}
          disabled={background?.locked}
          onChange={(_, d) => setPhoto(d.value)}
        >
          <option value="">No photo</option>
          {photos.map((p) => (
            <option key={p.id} value={p.id}>
              {p.fileName}
            </option>
          ))}
        </Select>
        {background && (
          <>
            <Slider
              className={styles.slider}
              size="small"
              aria-label="Photo opacity"
              min={10}
              max={100}
              value={Math.round(background.opacity * 100)}
              disabled={background.locked}
              onChange={(_, d) => store.run(setBackground, { background: { ...background, opacity: d.value / 100 } })}
            />
            <Checkbox
              label="Lock"
              checked={background.locked}
              onChange={(_, d) => store.run(setBackground, { background: { ...background, locked: d.checked === true } })}
            />
          </>
        )}
      </div>
      <ToolbarDivider />
      <Button size="small" onClick={onExportPng}>
        Export PNG
      </Button>
      <Button size="small" icon={<QuestionCircleRegular />} onClick={onHelp} aria-label="Keys and tools" title="Keys (?)" />
      <span className={styles.spacer} />
      {saveSlot && <Text as="span">{saveSlot}</Text>}
    </Toolbar>
  );
}
