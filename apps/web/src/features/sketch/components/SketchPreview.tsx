import type { CircuitDocument, CircuitEvaluation } from '@linesmith/routing';
import { useCallback, useMemo, useState } from 'react';
import { Layer, Stage } from 'react-konva';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import { sketchScale } from '../model/geometry/calibration';
import { contentBounds } from '../model/geometry/content-bounds';
import { lineEnds, unitsById } from '../model/geometry/line-route';
import { fitView } from '../model/view';
import { cutLengthLabel } from '../utils/cut-length-label';
import { flagPosition } from '../utils/flag-target';
import { fluidStyle } from '../utils/fluid-colours';
import { BackgroundImage } from './BackgroundImage';
import { FlagMarker } from './shapes/FlagMarker';
import { HeatZoneShape } from './shapes/HeatZoneShape';
import { LineShape } from './shapes/LineShape';
import { UnitShape } from './shapes/UnitShape';

export interface SketchPreviewProps {
  document: CircuitDocument;
  /** Cut-length labels and flag markers come from it; without it the sketch is drawn bare. */
  evaluation?: Pick<CircuitEvaluation, 'lines' | 'flags'>;
  /** Unit, line and heat-zone ids drawn as selected (changed or flagged items). */
  highlightIds?: readonly string[];
  width: number;
  height: number;
  /** Names the picture for screen readers, e.g. "Revision 3". */
  label?: string;
}

const none = () => {};
const noPorts: ReadonlySet<string> = new Set();

/** A read-only drawing of a circuit document, fitted to the box: for reviews, comparisons and the shop sheet. */
export function SketchPreview({ document: doc, evaluation, highlightIds = [], width, height, label = 'Sketch' }: SketchPreviewProps) {
  const { units } = useUnitPreferences();
  const [image, setImage] = useState<{ width: number; height: number } | undefined>();
  const onBackgroundSize = useCallback((size: { width: number; height: number }) => setImage(size), []);
  const view = fitView(contentBounds(doc, image), width, height, 16);
  const zoom = view.zoom;
  const pxPerIn = sketchScale(doc);
  const style = fluidStyle(doc.circuit.fluid);
  const unitLookup = useMemo(() => unitsById(doc), [doc]);
  const highlighted = useMemo(() => new Set(highlightIds), [highlightIds]);
  const reports = useMemo(() => new Map((evaluation?.lines ?? []).map((r) => [r.lineId, r])), [evaluation]);
  const connected = useMemo(
    () => new Set(doc.lines.flatMap((l) => [`${l.from.unitId}/${l.from.portId}`, `${l.to.unitId}/${l.to.portId}`])),
    [doc.lines],
  );
  const summary = `${label}: ${doc.units.length} units, ${doc.lines.length} lines, ${doc.heatZones.length} heat zones` +
    (highlighted.size > 0 ? `; ${highlighted.size} items highlighted` : '');

  return (
    <div role="img" aria-label={summary} style={{ width, height }}>
      <Stage width={width} height={height} scaleX={zoom} scaleY={zoom} x={view.x} y={view.y} listening={false}>
        <Layer>
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
              selected={highlighted.has(zone.id)}
              draggable={false}
              clearancePx={pxPerIn && zone.clearanceIn !== undefined ? pxPerIn * zone.clearanceIn : null}
              onSelect={none}
              onDragStart={none}
              onDragMove={none}
              onDragEnd={none}
            />
          ))}
          {doc.lines.map((line) => (
            <LineShape
              key={line.id}
              {...lineEnds(unitLookup, line)}
              line={line}
              report={reports.get(line.id)}
              pxPerIn={pxPerIn}
              fluid={style}
              zoom={zoom}
              selected={highlighted.has(line.id)}
              label={evaluation ? cutLengthLabel(reports.get(line.id), units.length) : ''}
              onSelect={none}
              onDoubleClick={none}
            />
          ))}
          {doc.units.map((unit) => (
            <UnitShape
              key={unit.id}
              unit={unit}
              zoom={zoom}
              selected={highlighted.has(unit.id)}
              selectedPortId={null}
              connectedPorts={connected.size > 0 ? connected : noPorts}
              draggable={false}
              onSelect={none}
              onSelectPort={none}
              onDragStart={none}
              onDragMove={none}
              onDragEnd={none}
            />
          ))}
        </Layer>
        <Layer>
          {evaluation?.flags.map((flag, i) => {
            const at = flagPosition(doc, flag);
            return at ? (
              <FlagMarker key={`${flag.code}:${i}`} x={at.x} y={at.y - 8 / zoom} zoom={zoom} severity={flag.severity} text={flag.code} onClick={none} />
            ) : null;
          })}
        </Layer>
      </Stage>
    </div>
  );
}
