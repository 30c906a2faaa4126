import { Line } from 'react-konva';

export interface SleeveBandProps {
  /** Flat sketch coordinates along the sleeved stretch. */
  points: number[];
  zoom: number;
  /** A planned but not yet placed sleeve is drawn dashed. */
  planned?: boolean;
}

/** A fire sleeve along part of a line: a wide band under the line. */
export function SleeveBand({ points, zoom, planned = false }: SleeveBandProps) {
  return (
    <Line
      points={points}
      stroke={planned ? '#f97316' : '#9a3412'}
      opacity={planned ? 0.5 : 0.55}
      strokeWidth={14 / zoom}
      dash={planned ? [6 / zoom, 6 / zoom] : undefined}
      lineCap="round"
      lineJoin="round"
      listening={false}
    />
  );
}
