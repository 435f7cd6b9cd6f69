// One list drives both the key handling and the help overlay.
import type { Tool } from '../../state/viewSlice';

export const TOOL_KEYS: { key: string; tool: Tool; label: string; hint: string }[] = [
  { key: 'v', tool: 'select', label: 'Select', hint: 'Pick and drag vertices, edges or shapes; shift adds to the selection; double-click an edge to insert a vertex' },
  { key: 'e', tool: 'enclosure', label: 'Enclosure', hint: 'Click the corners of the enclosing wall; finish on the first point, with Enter or a double-click' },
  { key: 'b', tool: 'solid', label: 'Body', hint: 'Click the corners of a solid body inside the enclosure; finish like the enclosure' },
  { key: 'r', tool: 'rectangle', label: 'Rectangle', hint: 'Drag from corner to corner (or click twice)' },
  { key: 't', tool: 'tube', label: 'Tube', hint: 'Drag from the centre out to the radius; the number of sides is set beside the tools' },
];

export const OTHER_KEYS: [string, string][] = [
  ['Ctrl+Z', 'Undo'],
  ['Ctrl+Shift+Z, Ctrl+Y', 'Redo'],
  ['Enter', 'Finish the outline being drawn'],
  ['Escape', 'Drop the outline being drawn, or clear the selection'],
  ['Delete, Backspace', 'Delete the selected vertices or shapes (while drawing: the last point)'],
  ['G', 'Snap to grid on or off'],
  ['F', 'Fit the sketch in view'],
  ['Space + drag', 'Pan (dragging empty space pans too)'],
  ['Mouse wheel', 'Zoom around the pointer'],
  ['Ctrl+S, Ctrl+O', 'Save, open a sketch file'],
  ['?', 'This help'],
];
