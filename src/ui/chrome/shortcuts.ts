// The keys besides the tool letters (those come from the tool registry), for the help overlay.
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
