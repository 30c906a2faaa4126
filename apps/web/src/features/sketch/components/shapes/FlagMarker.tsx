import type { Severity } from '@linesmith/routing';
import { Label, Tag, Text } from 'react-konva';

export interface FlagMarkerProps {
  x: number;
  y: number;
  severity: Severity;
  text: string;
  zoom: number;
  onClick(): void;
}

/** Severity is told by icon and word as well as colour. */
export const severityStyle: Readonly<Record<Severity, { icon: string; word: string; fill: string; text: string }>> = {
  blocker: { icon: '⛔', word: 'Blocker', fill: '#b91c1c', text: '#ffffff' },
  caution: { icon: '⚠', word: 'Caution', fill: '#fde68a', text: '#111827' },
  note: { icon: 'ℹ', word: 'Note', fill: '#dbeafe', text: '#111827' },
};

/** A flag on the canvas: icon and code on a tag pointing at the item. */
export function FlagMarker({ x, y, severity, text, zoom, onClick }: FlagMarkerProps) {
  const style = severityStyle[severity];
  return (
    <Label x={x} y={y} onClick={onClick} name="flag">
      <Tag fill={style.fill} stroke="#111827" strokeWidth={1 / zoom} pointerDirection="down" pointerWidth={8 / zoom} pointerHeight={6 / zoom} cornerRadius={3 / zoom} />
      <Text text={`${style.icon} ${text}`} fontSize={11 / zoom} padding={3 / zoom} fill={style.text} />
    </Label>
  );
}
