import { portPosition, type Flag } from '@linesmith/routing';
import type Konva from 'konva';
import type { KonvaEventObject } from 'konva/lib/Node';
import { forwardRef, useCallback, useEffect, useImperativeHandle, useMemo, useRef, useState } from 'react';
import { Circle, Layer, Line, Rect, Stage } from 'react-konva';
import { useEditor } from '../hooks/editor-context';
import { useEditorState } from '../hooks/useEditorState';
import { addCorner } from '../model/commands/add-corner';
import { addHeatZone } from '../model/commands/add-heat-zone';
import { addLine } from '../model/commands/add-line';
import { addSupport } from '../model/commands/add-support';
import { removeCorner } from '../model/commands/remove-corner';
import { dragFootprint, flagsFollowingDrag, type DragTarget } from '../model/drag-preview';
import { sketchScale } from '../model/geometry/calibration';
import { distanceAlongLine, lineEnds, linePathIn, nearestSegment, routePx, unitsById } from '../model/geometry/line-route';
import { findPortNear, PORT_SNAP_SCREEN_PX, portTaken } from '../model/geometry/snap-to-port';
import { isSelected, sameItem, type SelectedItem, type Selection } from '../model/selection';
import type { Point } from '../model/tools';
import { toSketch, zoomAt } from '../model/view';
import { cutLengthLabel } from '../utils/cut-length-label';
import { flagItem, flagPosition } from '../utils/flag-target';
import { fluidStyle } from '../utils/fluid-colours';
import { selectedPortOf, showsCornerHandles, zoneClearancePx } from '../utils/shape-props';
import { BackgroundImage } from './BackgroundImage';
import { DragPreviewLayer } from './DragPreviewLayer';
import { CornerHandle } from './shapes/CornerHandle';
import { FlagMarker } from './shapes/FlagMarker';
import { HeatZoneShape } from './shapes/HeatZoneShape';
import { DimensionLabel } from './shapes/DimensionLabel';
import { LineShape, labelPosition } from './shapes/LineShape';
import { UnitShape } from './shapes/UnitShape';

export interface SketchCanvasProps {
  width: number;
  height: number;
  onBackgroundSize?(size: { width: number; height: number }): void;
}

export interface SketchCanvasHandle {
  toPng(): string | null;
}

const ZOOM_STEP = 1.15;
const emptyFlags: ReadonlySet<Flag> = new Set();

/** The react-konva stage: it renders the document and turns pointer input into commands. */
export const SketchCanvas = forwardRef<SketchCanvasHandle, SketchCanvasProps>(function SketchCanvas(
  { width, height, onBackgroundSize },
  ref,
) {
  const { store, evaluation, lengthUnit, shopRules } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const selection = useEditorState(store, (s) => s.selection);
  const tool = useEditorState(store, (s) => s.tool);
  const view = useEditorState(store, (s) => s.view);
  const dragTarget = useEditorState(store, (s) => s.drag?.target ?? null);
  const stageRef = useRef<Konva.Stage>(null);
  const [cursor, setCursor] = useState<Point | null>(null);
  const [spaceDown, setSpaceDown] = useState(false);
  const pan = useRef<{ from: Point; view: typeof view } | null>(null);

  useImperativeHandle(ref, () => ({ toPng: () => stageRef.current?.toDataURL({ pixelRatio: 2 }) ?? null }), []);

  useEffect(() => {
    const down = (e: KeyboardEvent) => e.code === 'Space' && !isTyping(e) && setSpaceDown(true);
    const up = (e: KeyboardEvent) => e.code === 'Space' && setSpaceDown(false);
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, []);

  const pxPerIn = sketchScale(doc);
  const style = fluidStyle(doc.circuit.fluid);
  const reports = useMemo(() => new Map(evaluation.lines.map((r) => [r.lineId, r])), [evaluation]);
  const connected = useMemo(
    () => new Set(doc.lines.flatMap((l) => [`${l.from.unitId}/${l.from.portId}`, `${l.to.unitId}/${l.to.portId}`])),
    [doc.lines],
  );
  const zoom = view.zoom;
  const unitLookup = useMemo(() => unitsById(doc), [doc]);
  // While a drag runs its items are drawn by the drag-preview layer and left out here.
  const footprint = useMemo(() => (dragTarget ? dragFootprint(doc, dragTarget) : null), [doc, dragTarget]);
  const draggedFlags = useMemo(
    () => (footprint ? flagsFollowingDrag(doc, evaluation.flags, footprint) : null),
    [doc, evaluation, footprint],
  );

  const pointer = (): Point | null => {
    const stage = stageRef.current;
    const p = stage?.getPointerPosition();
    return p ? toSketch(store.getState().view, p) : null;
  };

  const choose = useCallback(
    (item: SelectedItem, e: KonvaEventObject<MouseEvent>) => {
      if (store.getState().tool !== 'select') return;
      e.cancelBubble = true;
      const current = store.getState().selection;
      if (e.evt.shiftKey) {
        store.select(isSelected(current, item) ? current.filter((s) => !sameItem(s, item)) : [...current, item]);
      } else if (!isSelected(current, item)) {
        store.select([item]);
      }
    },
    [store],
  );

  // --- Drags: a preview while the pointer moves, one history step on drop ---------------------
  // The handlers every shape shares take the item's id, so they stay the same from render to render
  // and a memoised shape re-renders only when its own data changes.
  const handlers = useMemo(() => {
    const dragSelectionFor = (item: SelectedItem): Selection => {
      const current = store.getState().selection;
      if (isSelected(current, item)) return current;
      store.select([item]);
      return [item];
    };
    return {
      selectUnit: (id: string, e: KonvaEventObject<MouseEvent>) => choose({ kind: 'unit', id }, e),
      selectPort: (unitId: string, id: string, e: KonvaEventObject<MouseEvent>) => choose({ kind: 'port', unitId, id }, e),
      selectLine: (id: string, e: KonvaEventObject<MouseEvent>) => choose({ kind: 'line', id }, e),
      selectZone: (id: string, e: KonvaEventObject<MouseEvent>) => choose({ kind: 'zone', id }, e),
      dragUnit: (id: string) => store.startDrag('Move unit', { kind: 'selection', selection: dragSelectionFor({ kind: 'unit', id }) }),
      dragZone: (id: string) => store.startDrag('Move heat zone', { kind: 'selection', selection: dragSelectionFor({ kind: 'zone', id }) }),
      dragCorner: (target: Extract<DragTarget, { kind: 'corner' }>) => store.startDrag('Move corner', target),
      dragTo: (dx: number, dy: number) => store.dragTo(dx, dy),
      drop: () => store.endDrag(),
      addCornerAt: (lineId: string, p: Point) => {
        const current = store.getState().history.doc;
        const line = current.lines.find((l) => l.id === lineId);
        const route = line && routePx(current, line);
        if (route) store.run(addCorner, { lineId, index: nearestSegment(route, p).index, x: p.x, y: p.y });
      },
    };
  }, [store, choose]);

  const onStageMouseDown = (e: KonvaEventObject<MouseEvent>) => {
    const screen = stageRef.current?.getPointerPosition();
    if (!screen) return;
    if (e.evt.button === 1 || spaceDown) {
      e.evt.preventDefault();
      pan.current = { from: screen, view: store.getState().view };
      return;
    }
    const onEmpty = e.target === stageRef.current || e.target.name() === 'background';
    if (tool === 'select' && onEmpty && e.evt.button === 0) {
      const p = pointer()!;
      store.setToolDraft({ tool: 'marquee', start: p, end: p });
    }
  };

  const onStageMouseMove = () => {
    const screen = stageRef.current?.getPointerPosition();
    if (!screen) return;
    if (pan.current) {
      const { from, view: v } = pan.current;
      store.setView({ ...v, x: v.x + screen.x - from.x, y: v.y + screen.y - from.y });
      return;
    }
    const p = toSketch(store.getState().view, screen);
    // Only the drawing tools show a rubber band to the cursor; the select tool re-renders nothing here.
    if (store.getState().tool !== 'select') setCursor(p);
    const d = store.getState().toolDraft;
    if (d?.tool === 'marquee') store.setToolDraft({ ...d, end: p });
  };

  const onStageMouseUp = (e: KonvaEventObject<MouseEvent>) => {
    if (pan.current) {
      pan.current = null;
      return;
    }
    const d = store.getState().toolDraft;
    if (d?.tool === 'marquee') {
      store.setToolDraft(null);
      const box = { minX: Math.min(d.start.x, d.end.x), maxX: Math.max(d.start.x, d.end.x), minY: Math.min(d.start.y, d.end.y), maxY: Math.max(d.start.y, d.end.y) };
      if (box.maxX - box.minX < 3 / zoom && box.maxY - box.minY < 3 / zoom) {
        if (!e.evt.shiftKey) store.select([]);
        return;
      }
      const inside = (p: Point) => p.x >= box.minX && p.x <= box.maxX && p.y >= box.minY && p.y <= box.maxY;
      const found: SelectedItem[] = [
        ...doc.units.filter((u) => inside(u)).map((u) => ({ kind: 'unit' as const, id: u.id })),
        ...doc.lines.filter((l) => (routePx(doc, l) ?? []).every(inside)).map((l) => ({ kind: 'line' as const, id: l.id })),
        ...doc.heatZones.filter((z) => z.polygon.every(inside)).map((z) => ({ kind: 'zone' as const, id: z.id })),
      ];
      store.select(e.evt.shiftKey ? [...store.getState().selection, ...found] : found);
    }
  };

  const onStageClick = (e: KonvaEventObject<MouseEvent>) => {
    if (e.evt.button !== 0 || spaceDown) return;
    const p = pointer();
    if (!p) return;
    const d = store.getState().toolDraft;
    if (tool === 'line') {
      const port = findPortNear(doc, p, PORT_SNAP_SCREEN_PX / zoom);
      if (d?.tool !== 'line') {
        if (port && !portTaken(doc, port)) store.setToolDraft({ tool: 'line', from: { unitId: port.unitId, portId: port.portId }, corners: [] });
        return;
      }
      if (port) {
        const same = port.unitId === d.from.unitId && port.portId === d.from.portId;
        if (same || portTaken(doc, port)) return;
        const id = crypto.randomUUID();
        store.run(addLine, { from: d.from, to: { unitId: port.unitId, portId: port.portId }, corners: d.corners, id });
        store.setToolDraft(null);
        store.select([{ kind: 'line', id }]);
        return;
      }
      store.setToolDraft({ ...d, corners: [...d.corners, p] });
    } else if (tool === 'calibrate') {
      if (d?.tool !== 'calibrate' || d.b) store.setToolDraft({ tool: 'calibrate', a: p, b: null });
      else if (p.x !== d.a.x || p.y !== d.a.y) store.setToolDraft({ ...d, b: p });
    } else if (tool === 'heat-zone') {
      const points = d?.tool === 'heat-zone' ? d.points : [];
      store.setToolDraft({ tool: 'heat-zone', points: [...points, p] });
    } else if (tool === 'support') {
      placeSupport(p);
    }
  };

  const placeSupport = (p: Point) => {
    if (!pxPerIn) return;
    let best: { lineId: string; distance: number } | null = null;
    for (const line of doc.lines) {
      const route = routePx(doc, line);
      if (!route) continue;
      const near = nearestSegment(route, p);
      if (near.distance <= 12 / zoom && (!best || near.distance < best.distance)) best = { lineId: line.id, distance: near.distance };
    }
    if (!best) return;
    const line = doc.lines.find((l) => l.id === best.lineId)!;
    const geometry = linePathIn(doc, line, pxPerIn, reports.get(line.id)?.measuredLengthIn ?? null);
    if (!geometry) return;
    store.run(addSupport, { lineId: line.id, atIn: distanceAlongLine(geometry, p, pxPerIn) });
    store.select([{ kind: 'line', id: line.id }]);
  };

  const onStageDblClick = () => {
    const d = store.getState().toolDraft;
    if (tool === 'heat-zone' && d?.tool === 'heat-zone') closeZone(d.points);
  };

  const closeZone = (points: Point[]) => {
    // A double-click also lands as two clicks: drop repeated points before closing.
    const unique = points.filter((p, i) => i === 0 || Math.hypot(p.x - points[i - 1].x, p.y - points[i - 1].y) > 2 / zoom);
    if (unique.length < 3) return;
    const id = crypto.randomUUID();
    store.run(addHeatZone, { polygon: unique, id });
    store.setToolDraft(null);
    store.setTool('select');
    store.select([{ kind: 'zone', id }]);
  };

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const d = store.getState().toolDraft;
      if (e.key === 'Enter' && d?.tool === 'heat-zone' && !isTyping(e)) closeZone(d.points);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });

  const onWheel = (e: KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const screen = stageRef.current?.getPointerPosition();
    if (!screen) return;
    store.setView(zoomAt(store.getState().view, e.evt.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, screen));
  };

  const draggable = tool === 'select' && !spaceDown;
  const selectedLineIds = new Set(selection.filter((s) => s.kind === 'line').map((s) => s.id));
  const cornerSelected = (lineId: string, index: number) => isSelected(selection, { kind: 'corner', lineId, index });

  return (
    <Stage
      ref={stageRef}
      width={width}
      height={height}
      scaleX={zoom}
      scaleY={zoom}
      x={view.x}
      y={view.y}
      onMouseDown={onStageMouseDown}
      onMouseMove={onStageMouseMove}
      onMouseUp={onStageMouseUp}
      onClick={onStageClick}
      onDblClick={onStageDblClick}
      onWheel={onWheel}
      onContextMenu={(e) => e.evt.preventDefault()}
      style={{ cursor: spaceDown ? 'grab' : tool === 'select' ? 'default' : 'crosshair' }}
    >
      <Layer listening={!doc.background?.locked}>
        {doc.background && (
          <BackgroundImage uploadId={doc.background.uploadId} opacity={doc.background.opacity} onSize={onBackgroundSize} />
        )}
      </Layer>
      <Layer>
        {doc.heatZones.map((zone) => (
          <HeatZoneShape
            key={zone.id}
            zone={zone}
            zoom={zoom}
            selected={isSelected(selection, { kind: 'zone', id: zone.id })}
            draggable={draggable}
            hidden={footprint?.zones.has(zone.id)}
            clearancePx={zoneClearancePx(zone, pxPerIn, shopRules)}
            onSelect={handlers.selectZone}
            onDragStart={handlers.dragZone}
            onDragMove={handlers.dragTo}
            onDragEnd={handlers.drop}
          />
        ))}
        {doc.lines.map((line) => (
          <LineShape
            key={line.id}
            line={line}
            {...lineEnds(unitLookup, line)}
            report={reports.get(line.id)}
            pxPerIn={pxPerIn}
            fluid={style}
            zoom={zoom}
            selected={selectedLineIds.has(line.id)}
            hidden={footprint?.lines.has(line.id)}
            onSelect={handlers.selectLine}
            onDoubleClick={handlers.addCornerAt}
          />
        ))}
        {doc.units.map((unit) => (
          <UnitShape
            key={unit.id}
            unit={unit}
            zoom={zoom}
            selected={isSelected(selection, { kind: 'unit', id: unit.id })}
            selectedPortId={selectedPortOf(selection, unit.id)}
            connectedPorts={connected}
            draggable={draggable}
            hidden={footprint?.units.has(unit.id)}
            onSelect={handlers.selectUnit}
            onSelectPort={handlers.selectPort}
            onDragStart={handlers.dragUnit}
            onDragMove={handlers.dragTo}
            onDragEnd={handlers.drop}
          />
        ))}
        {doc.lines
          .filter((line) => showsCornerHandles(selection, line.id, line.points.length))
          .flatMap((line) =>
            line.points.map((p, index) => (
              <CornerHandle
                key={`${line.id}:${index}`}
                x={p.x}
                y={p.y}
                zoom={zoom}
                selected={cornerSelected(line.id, index)}
                hidden={footprint?.lines.has(line.id)}
                onPointerDown={(e) => {
                  e.cancelBubble = true;
                  if (e.evt.altKey) {
                    store.run(removeCorner, { lineId: line.id, index });
                    return;
                  }
                  store.select([{ kind: 'line', id: line.id }, { kind: 'corner', lineId: line.id, index }]);
                }}
                onDragStart={() => handlers.dragCorner({ kind: 'corner', lineId: line.id, index, from: { x: p.x, y: p.y } })}
                onDragMove={handlers.dragTo}
                onDragEnd={handlers.drop}
              />
            )),
          )}
      </Layer>
      <Layer>
        {doc.lines.map((line) => {
          if (footprint?.lines.has(line.id)) return null;
          const route = routePx(doc, line);
          if (!route) return null;
          const at = labelPosition(route);
          return (
            <DimensionLabel
              key={line.id}
              x={at.x + 6 / zoom}
              y={at.y + 6 / zoom}
              text={cutLengthLabel(reports.get(line.id), lengthUnit)}
              style={style}
              zoom={zoom}
            />
          );
        })}
        {evaluation.flags.map((flag, i) => {
          if (draggedFlags?.has(flag)) return null;
          const at = flagPosition(doc, flag);
          if (!at) return null;
          const item = flagItem(flag);
          return (
            <FlagMarker
              key={`${flag.code}:${i}`}
              x={at.x}
              y={at.y - 8 / zoom}
              zoom={zoom}
              severity={flag.severity}
              text={flag.code}
              onClick={() => item && store.select([item])}
            />
          );
        })}
      </Layer>
      {footprint && (
        <DragPreviewLayer
          footprint={footprint}
          flags={draggedFlags ?? emptyFlags}
          selection={selection}
          zoom={zoom}
          pxPerIn={pxPerIn}
          fluid={style}
          reports={reports}
          connectedPorts={connected}
        />
      )}
      <Layer listening={false}>
        <DraftOverlay zoom={zoom} cursor={cursor} />
      </Layer>
    </Stage>
  );
});

/** True while the user types in a field, so canvas keys stay out of the way. */
export function isTyping(e: KeyboardEvent): boolean {
  const el = e.target as HTMLElement | null;
  return !!el && (el.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(el.tagName));
}

function DraftOverlay({ zoom, cursor }: { zoom: number; cursor: Point | null }) {
  const { store } = useEditor();
  const doc = useEditorState(store, (s) => s.history.doc);
  const draft = useEditorState(store, (s) => s.toolDraft);
  if (!draft) return null;
  const dash = [6 / zoom, 4 / zoom];
  switch (draft.tool) {
    case 'line': {
      const unit = doc.units.find((u) => u.id === draft.from.unitId);
      const from = unit?.ports.find((p) => p.id === draft.from.portId);
      if (!unit || !from) return null;
      const origin = portPosition(unit, from);
      const pts = [origin, ...draft.corners, ...(cursor ? [cursor] : [])].flatMap((p) => [p.x, p.y]);
      return <Line points={pts} stroke="#2563eb" strokeWidth={3 / zoom} dash={dash} />;
    }
    case 'calibrate': {
      const end = draft.b ?? cursor;
      return (
        <>
          <Circle x={draft.a.x} y={draft.a.y} radius={5 / zoom} stroke="#7c3aed" strokeWidth={2 / zoom} />
          {end && <Line points={[draft.a.x, draft.a.y, end.x, end.y]} stroke="#7c3aed" strokeWidth={2 / zoom} dash={dash} />}
          {end && <Circle x={end.x} y={end.y} radius={5 / zoom} stroke="#7c3aed" strokeWidth={2 / zoom} />}
        </>
      );
    }
    case 'heat-zone': {
      const pts = [...draft.points, ...(cursor ? [cursor] : [])].flatMap((p) => [p.x, p.y]);
      return <Line points={pts} closed={draft.points.length > 1} stroke="#dc2626" fill="rgba(220,38,38,0.1)" strokeWidth={2 / zoom} dash={dash} />;
    }
    case 'marquee':
      return (
        <Rect
          x={Math.min(draft.start.x, draft.end.x)}
          y={Math.min(draft.start.y, draft.end.y)}
          width={Math.abs(draft.end.x - draft.start.x)}
          height={Math.abs(draft.end.y - draft.start.y)}
          stroke="#2563eb"
          strokeWidth={1 / zoom}
          dash={dash}
          fill="rgba(37,99,235,0.08)"
        />
      );
  }
}
