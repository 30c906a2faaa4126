import type { Flag, LineReport } from '@linesmith/routing';
import { useMemo } from 'react';
import { Layer } from 'react-konva';
import { useEditor } from '../hooks/editor-context';
import { useEditorState } from '../hooks/useEditorState';
import { previewDocument, type DragFootprint } from '../model/drag-preview';
import { lineEnds, routePx, unitsById } from '../model/geometry/line-route';
import { isSelected, type Selection } from '../model/selection';
import { cutLengthLabel } from '../utils/cut-length-label';
import { flagPosition } from '../utils/flag-target';
import type { FluidStyle } from '../utils/fluid-colours';
import { selectedPortOf, showsCornerHandles, zoneClearancePx } from '../utils/shape-props';
import { CornerHandle } from './shapes/CornerHandle';
import { DimensionLabel } from './shapes/DimensionLabel';
import { FlagMarker } from './shapes/FlagMarker';
import { HeatZoneShape } from './shapes/HeatZoneShape';
import { LineShape, labelPosition } from './shapes/LineShape';
import { UnitShape } from './shapes/UnitShape';

export interface DragPreviewLayerProps {
  /** What the drag moves; the canvas leaves these items out of its own layers meanwhile. */
  footprint: DragFootprint;
  /** The flags whose markers move with the drag. */
  flags: ReadonlySet<Flag>;
  selection: Selection;
  zoom: number;
  pxPerIn: number | null;
  fluid: FluidStyle;
  reports: ReadonlyMap<string, LineReport>;
  connectedPorts: ReadonlySet<string>;
}

const none = () => undefined;

/**
 * The items a drag moves, drawn where they would be dropped, on a layer of their own: per pointer
 * move only this layer re-renders and redraws, the rest of the sketch stays as it was.
 */
export function DragPreviewLayer({ footprint, flags, selection, zoom, pxPerIn, fluid, reports, connectedPorts }: DragPreviewLayerProps) {
  const { store, lengthUnit, shopRules } = useEditor();
  const drag = useEditorState(store, (s) => s.drag);
  const doc = useEditorState(store, (s) => s.history.doc);
  const shown = useMemo(() => (drag ? previewDocument(doc, drag) : doc), [doc, drag]);
  const units = useMemo(() => unitsById(shown), [shown]);
  const lines = shown.lines.filter((l) => footprint.lines.has(l.id));
  return (
    <Layer listening={false}>
      {shown.heatZones
        .filter((z) => footprint.zones.has(z.id))
        .map((zone) => (
          <HeatZoneShape
            key={zone.id}
            zone={zone}
            zoom={zoom}
            selected={isSelected(selection, { kind: 'zone', id: zone.id })}
            draggable={false}
            clearancePx={zoneClearancePx(zone, pxPerIn, shopRules)}
            onSelect={none}
            onDragStart={none}
            onDragMove={none}
            onDragEnd={none}
          />
        ))}
      {lines.map((line) => (
        <LineShape
          key={line.id}
          {...lineEnds(units, line)}
          line={line}
          report={reports.get(line.id)}
          pxPerIn={pxPerIn}
          fluid={fluid}
          zoom={zoom}
          selected={isSelected(selection, { kind: 'line', id: line.id })}
          onSelect={none}
          onDoubleClick={none}
        />
      ))}
      {shown.units
        .filter((u) => footprint.units.has(u.id))
        .map((unit) => (
          <UnitShape
            key={unit.id}
            unit={unit}
            zoom={zoom}
            selected={isSelected(selection, { kind: 'unit', id: unit.id })}
            selectedPortId={selectedPortOf(selection, unit.id)}
            connectedPorts={connectedPorts}
            draggable={false}
            onSelect={none}
            onSelectPort={none}
            onDragStart={none}
            onDragMove={none}
            onDragEnd={none}
          />
        ))}
      {lines
        .filter((line) => showsCornerHandles(selection, line.id, line.points.length))
        .flatMap((line) =>
          line.points.map((p, index) => (
            <CornerHandle
              key={`${line.id}:${index}`}
              x={p.x}
              y={p.y}
              zoom={zoom}
              selected={isSelected(selection, { kind: 'corner', lineId: line.id, index })}
              draggable={false}
              onPointerDown={none}
              onDragStart={none}
              onDragMove={none}
              onDragEnd={none}
            />
          )),
        )}
      {lines.map((line) => {
        const route = routePx(shown, line);
        if (!route) return null;
        const at = labelPosition(route);
        const text = cutLengthLabel(reports.get(line.id), lengthUnit);
        return <DimensionLabel key={line.id} x={at.x + 6 / zoom} y={at.y + 6 / zoom} text={text} style={fluid} zoom={zoom} />;
      })}
      {[...flags].map((flag, i) => {
        const at = flagPosition(shown, flag);
        if (!at) return null;
        return (
          <FlagMarker key={`${flag.code}:${i}`} x={at.x} y={at.y - 8 / zoom} zoom={zoom} severity={flag.severity} text={flag.code} onClick={none} />
        );
      })}
    </Layer>
  );
}
