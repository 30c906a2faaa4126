import { Circle, Group, Text } from 'react-konva';

export interface SupportMarkProps {
  x: number;
  y: number;
  zoom: number;
}

/** A clamp point on a line: a ring with a "C". */
export function SupportMark({ x, y, zoom }: SupportMarkProps) {
  const r = 6 / zoom;
  return (
    <Group x={x} y={y} listening={false}>
      <Circle radius={r} fill="#ffffff" stroke="#111827" strokeWidth={1.5 / zoom} />
      <Text text="C" fontSize={9 / zoom} x={-r} y={-r / 1.6} width={2 * r} align="center" fill="#111827" />
    </Group>
  );
}
