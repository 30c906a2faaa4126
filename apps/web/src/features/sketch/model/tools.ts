import type { PortRef } from '@linesmith/routing';

export type ToolId = 'select' | 'line' | 'calibrate' | 'heat-zone' | 'support';

export interface ToolInfo {
  id: ToolId;
  label: string;
  key: string;
  hint: string;
}

/** The drawing tools and their keys; the help dialog and the toolbar read this one list. */
export const tools: readonly ToolInfo[] = [
  { id: 'select', label: 'Select', key: 'V', hint: 'Click to select, drag to move; drag on empty canvas to select an area.' },
  { id: 'line', label: 'Draw line', key: 'L', hint: 'Click a port, click the corners, click the other port. Esc cancels.' },
  { id: 'calibrate', label: 'Calibrate', key: 'C', hint: 'Click two points a known distance apart, then type the distance.' },
  { id: 'heat-zone', label: 'Heat zone', key: 'H', hint: 'Click the corners of the hot area; Enter or double-click closes it.' },
  { id: 'support', label: 'Support', key: 'S', hint: 'Click on a line to put a clamp there.' },
];

export interface Point {
  x: number;
  y: number;
}

/** What a tool is in the middle of drawing (not part of the document until finished). */
export type ToolDraft =
  | { tool: 'line'; from: PortRef; corners: Point[] }
  | { tool: 'calibrate'; a: Point; b: Point | null }
  | { tool: 'heat-zone'; points: Point[] }
  | { tool: 'marquee'; start: Point; end: Point };

/** Other keys, for the help dialog. */
export const otherShortcuts: ReadonlyArray<{ keys: string; action: string }> = [
  { keys: 'Delete / Backspace', action: 'Delete the selection' },
  { keys: 'Ctrl/⌘ + D', action: 'Duplicate the selection' },
  { keys: 'Ctrl/⌘ + Z', action: 'Undo' },
  { keys: 'Ctrl/⌘ + Shift + Z, Ctrl + Y', action: 'Redo' },
  { keys: 'Space + drag, middle button', action: 'Pan' },
  { keys: 'Wheel, + / −', action: 'Zoom' },
  { keys: 'F', action: 'Fit the sketch to the window' },
  { keys: 'Double-click a line', action: 'Insert a corner' },
  { keys: 'Alt + click a corner', action: 'Remove the corner' },
  { keys: 'Esc', action: 'Cancel the drawing, clear the selection' },
  { keys: '?', action: 'This help' },
];
