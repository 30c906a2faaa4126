import { makeStyles, tokens } from '@fluentui/react-components';
import type { Part } from '@linesmith/catalog';
import type { LengthUnit, ShopRules, UnitKind } from '@linesmith/routing';
import { useCallback, useMemo, useRef, useState, type ReactNode } from 'react';
import { SafetyNote } from '../../shell/components/SafetyNote';
import { EditorContext, type EditorContextValue } from '../hooks/editor-context';
import { useCircuitEvaluation } from '../hooks/useCircuitEvaluation';
import { useEditorShortcuts } from '../hooks/useEditorShortcuts';
import { useEditorState } from '../hooks/useEditorState';
import { useElementSize } from '../hooks/useElementSize';
import { addUnit } from '../model/commands/add-unit';
import { calibrate } from '../model/commands/calibrate';
import type { EditorStore } from '../model/editor-store';
import { contentBounds } from '../model/geometry/content-bounds';
import { fitView, toSketch, zoomAt } from '../model/view';
import { CalibrateDialog } from './CalibrateDialog';
import { FlagsPanel } from './panels/FlagsPanel';
import { FluidLegend } from './panels/FluidLegend';
import { Inspector } from './panels/Inspector';
import { OutlineList } from './panels/OutlineList';
import { Palette } from './panels/Palette';
import { HelpDialog } from './HelpDialog';
import { SketchCanvas, type SketchCanvasHandle } from './SketchCanvas';
import { SketchToolbar } from './SketchToolbar';
import { StatusBar } from './StatusBar';

export interface SketchEditorProps {
  store: EditorStore;
  parts: readonly Part[];
  shopRules: ShopRules;
  lengthUnit: LengthUnit;
  photos?: ReadonlyArray<{ id: string; fileName: string }>;
  /** File name (without extension) for the PNG export. */
  exportName?: string;
  saveSlot?: ReactNode;
}

const useStyles = makeStyles({
  root: {
    display: 'grid',
    gridTemplateColumns: '220px minmax(0, 1fr) 340px',
    gridTemplateRows: 'auto minmax(0, 1fr) auto',
    gridTemplateAreas: '"tools tools tools" "left canvas right" "left status right"',
    height: 'calc(100vh - 180px)',
    minHeight: '520px',
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    background: tokens.colorNeutralBackground1,
  },
  tools: { gridArea: 'tools', borderBottom: `1px solid ${tokens.colorNeutralStroke2}`, padding: tokens.spacingVerticalXXS },
  left: { gridArea: 'left', minWidth: 0, overflowWrap: 'anywhere', overflowY: 'auto', padding: tokens.spacingVerticalS, display: 'grid', alignContent: 'start', gap: tokens.spacingVerticalM, borderRight: `1px solid ${tokens.colorNeutralStroke2}` },
  canvas: { gridArea: 'canvas', position: 'relative', overflow: 'hidden', background: '#fafaf9' },
  status: { gridArea: 'status' },
  right: {
    // Native selects size to their longest option; keep the long part names inside the panel.
    '& .fui-Select, & select, & input': { maxWidth: '100%', minWidth: 0 },
    gridTemplateColumns: 'minmax(0, 1fr)',
    gridArea: 'right',
    minWidth: 0, overflowX: 'hidden', overflowWrap: 'anywhere', overflowY: 'auto', padding: tokens.spacingVerticalS, display: 'grid', alignContent: 'start', gap: tokens.spacingVerticalM, borderLeft: `1px solid ${tokens.colorNeutralStroke2}` },
});

/** The circuit sketch editor: palette and outline, canvas, inspector and flags, all over one store. */
export function SketchEditor({ store, parts, shopRules, lengthUnit, photos = [], exportName = 'circuit-sketch', saveSlot }: SketchEditorProps) {
  const styles = useStyles();
  const doc = useEditorState(store, (s) => s.history.doc);
  const draft = useEditorState(store, (s) => s.toolDraft);
  const view = useEditorState(store, (s) => s.view);
  const evaluation = useCircuitEvaluation(doc, parts, shopRules);
  const partsById = useMemo(() => new Map(parts.map((p) => [p.id, p])), [parts]);
  const canvasBox = useElementSize<HTMLDivElement>();
  const canvasRef = useRef<SketchCanvasHandle>(null);
  const [helpOpen, setHelpOpen] = useState(false);
  const [photoSize, setPhotoSize] = useState<{ width: number; height: number } | undefined>();
  const { width, height } = canvasBox;

  const focusOn = useCallback(
    (point: { x: number; y: number }) => {
      const { zoom } = store.getState().view;
      store.setView({ zoom, x: width / 2 - point.x * zoom, y: height / 2 - point.y * zoom });
    },
    [store, width, height],
  );
  const actions = useMemo(
    () => ({
      fit: () => store.setView(fitView(contentBounds(store.getState().history.doc, photoSize), width, height)),
      zoomBy: (factor: number) => store.setView(zoomAt(store.getState().view, factor, { x: width / 2, y: height / 2 })),
      openHelp: () => setHelpOpen(true),
    }),
    [store, width, height, photoSize],
  );
  useEditorShortcuts(store, actions);

  const placeUnit = (kind: UnitKind) => {
    const centre = toSketch(store.getState().view, { x: width / 2, y: height / 2 });
    const offset = (store.getState().history.doc.units.length % 5) * 20;
    const id = crypto.randomUUID();
    store.run(addUnit, { kind, x: Math.round(centre.x + offset), y: Math.round(centre.y + offset), id });
    store.select([{ kind: 'unit', id }]);
  };

  const exportPng = () => {
    const url = canvasRef.current?.toPng();
    if (!url) return;
    const link = document.createElement('a');
    link.href = url;
    link.download = `${exportName}.png`;
    link.click();
  };

  const context: EditorContextValue = { store, parts, partsById, shopRules, evaluation, lengthUnit, focusOn };
  return (
    <EditorContext.Provider value={context}>
      <div className={styles.root}>
        <div className={styles.tools}>
          <SketchToolbar
            photos={photos}
            onFit={actions.fit}
            onZoom={actions.zoomBy}
            onHelp={() => setHelpOpen(true)}
            onExportPng={exportPng}
            saveSlot={saveSlot}
          />
        </div>
        <aside className={styles.left} aria-label="Palette and outline">
          <Palette onAdd={placeUnit} />
          <OutlineList />
          <FluidLegend fluid={doc.circuit.fluid} />
        </aside>
        <div
          className={styles.canvas}
          ref={canvasBox.ref}
          aria-label="Sketch canvas"
          role="application"
          // The view transform, for browser journeys that click sketch coordinates.
          data-zoom={view.zoom}
          data-pan-x={view.x}
          data-pan-y={view.y}
        >
          <SketchCanvas ref={canvasRef} width={width} height={height} onBackgroundSize={setPhotoSize} />
        </div>
        <div className={styles.status}>
          <StatusBar />
        </div>
        <aside className={styles.right} aria-label="Inspector and flags">
          <Inspector />
          <FlagsPanel />
          <SafetyNote />
        </aside>
      </div>
      <HelpDialog open={helpOpen} onClose={() => setHelpOpen(false)} />
      {draft?.tool === 'calibrate' && draft.b && (
        <CalibrateDialog
          a={draft.a}
          b={draft.b}
          unit={lengthUnit}
          onCancel={() => store.setToolDraft(null)}
          onCalibrate={(knownIn) => {
            store.run(calibrate, { a: draft.a, b: draft.b!, knownIn });
            store.setTool('select');
          }}
        />
      )}
    </EditorContext.Provider>
  );
}
