import type { CircuitUnit } from '@linesmith/routing';
import type { KonvaEventObject } from 'konva/lib/Node';
import { memo } from 'react';
import { Group, Rect, Text } from 'react-konva';
import { unitSize } from '../../model/unit-presets';
import { pinnedDrag } from './pinned-drag';
import { PortShape } from './PortShape';

export interface UnitShapeProps {
  unit: CircuitUnit;
  selected: boolean;
  selectedPortId: string | null;
  connectedPorts: ReadonlySet<string>;
  draggable: boolean;
  /** Left out of the drawing while a drag preview draws it elsewhere. */
  hidden?: boolean;
  zoom: number;
  onSelect(unitId: string, event: KonvaEventObject<MouseEvent>): void;
  onSelectPort(unitId: string, portId: string, event: KonvaEventObject<MouseEvent>): void;
  onDragStart(unitId: string): void;
  /** The pointer's travel since the drag started, in sketch pixels (the unit itself stays put). */
  onDragMove(dx: number, dy: number): void;
  onDragEnd(): void;
}

const mountFill: Record<CircuitUnit['mountGroup'], string> = { powertrain: '#e0e7ff', chassis: '#f3f4f6', axle: '#ecfccb' };

/** A unit: a box turned with the unit, its name and mount group, and its ports on the edges. */
export const UnitShape = memo(function UnitShape(props: UnitShapeProps) {
  const { unit, selected, zoom } = props;
  const { width, height } = unitSize(unit.kind);
  return (
    <Group
      x={unit.x}
      y={unit.y}
      rotation={unit.rotation}
      visible={!props.hidden}
      draggable={props.draggable}
      {...pinnedDrag({ onDragStart: () => props.onDragStart(unit.id), onDragMove: props.onDragMove, onDragEnd: props.onDragEnd })}
      name="unit"
    >
      <Rect
        x={-width / 2}
        y={-height / 2}
        width={width}
        height={height}
        cornerRadius={6}
        fill={mountFill[unit.mountGroup]}
        stroke={selected ? '#2563eb' : '#374151'}
        strokeWidth={(selected ? 3 : 1.5) / zoom}
        dash={unit.mountGroup === 'chassis' ? undefined : [8 / zoom, 4 / zoom]}
        onClick={(e) => props.onSelect(unit.id, e)}
       
      />
      <Text
        text={`${unit.label || unit.kind}\n${unit.mountGroup}`}
        x={-width / 2}
        y={-height / 2 + 6}
        width={width}
        align="center"
        fontSize={12}
        fill="#111827"
        listening={false}
      />
      {unit.ports.map((port) => (
        <PortShape
          key={port.id}
          port={port}
          zoom={zoom}
          selected={props.selectedPortId === port.id}
          connected={props.connectedPorts.has(`${unit.id}/${port.id}`)}
          onSelect={(e) => props.onSelectPort(unit.id, port.id, e)}
        />
      ))}
    </Group>
  );
});
