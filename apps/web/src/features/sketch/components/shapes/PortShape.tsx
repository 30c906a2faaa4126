import type { CircuitPort } from '@linesmith/routing';
import type { KonvaEventObject } from 'konva/lib/Node';
import { Circle, Group, Text } from 'react-konva';

export interface PortShapeProps {
  port: CircuitPort;
  selected: boolean;
  /** True when a line ends here. */
  connected: boolean;
  zoom: number;
  onSelect(event: KonvaEventObject<MouseEvent>): void;
}

/** A port: a ring (female) or a dot (male) with its label; lubrication-feeding ports get a double ring. */
export function PortShape({ port, selected, connected, zoom, onSelect }: PortShapeProps) {
  const r = 6 / zoom;
  return (
    <Group x={port.dx} y={port.dy} onClick={onSelect} name="port">
      {port.feedsLubrication && <Circle radius={r * 1.7} stroke="#b45309" strokeWidth={1.5 / zoom} />}
      <Circle
        radius={r}
        fill={port.connection.gender === 'male' ? '#1f2937' : '#ffffff'}
        stroke={selected ? '#2563eb' : connected ? '#1f2937' : '#b91c1c'}
        strokeWidth={(selected ? 3 : 2) / zoom}
        hitStrokeWidth={8 / zoom}
      />
      <Text
        text={port.label || port.connection.size}
        x={r * 1.6}
        y={-r * 2.4}
        fontSize={11 / zoom}
        fill="#111827"
        listening={false}
      />
    </Group>
  );
}
