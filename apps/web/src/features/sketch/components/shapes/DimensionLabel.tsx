import { memo } from 'react';
import { Label, Tag, Text } from 'react-konva';
import type { FluidStyle } from '../../utils/fluid-colours';

export interface DimensionLabelProps {
  x: number;
  y: number;
  text: string;
  style: FluidStyle;
  zoom: number;
}

/** A line's cut length, on a tag in the line's fluid-class colours. */
export const DimensionLabel = memo(function DimensionLabel({ x, y, text, style, zoom }: DimensionLabelProps) {
  return (
    <Label x={x} y={y} listening={false} name="dimension">
      <Tag fill={style.stroke} stroke="#111827" strokeWidth={0.5 / zoom} cornerRadius={3 / zoom} />
      <Text text={text} fontSize={12 / zoom} padding={3 / zoom} fill={style.text} fontStyle="bold" />
    </Label>
  );
});
