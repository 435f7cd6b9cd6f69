// The keys besides the tool letters (those come from the tool registry), for the help overlay.
export const OTHER_KEYS: [string, string][] = [
  ['Ctrl+Z', 'Undo'],
  ['Ctrl+Shift+Z, Ctrl+Y', 'Redo'],
  [
    '0–9 . - ,',
    'While drawing: type x,y for the first point; then length or length,angle (degrees) for the next edge; width,height for a rectangle; the diameter (or a radius ending in r) for a tube',
  ],
  ['Enter', 'Place the typed point or size; with nothing typed, finish the outline being drawn'],
  ['Escape', 'Drop the typed value, then the outline being drawn, or clear the selection'],
  ['Ctrl+C, Ctrl+V', 'Copy the selected shapes; paste them one grid step right and down'],
  ['Ctrl+D', 'Duplicate the selected shapes'],
  ['N', 'Surface names on the canvas on or off'],
  ['Delete, Backspace', 'Delete the selected vertices or shapes (while drawing: the last point)'],
  ['G', 'Snap to grid on or off'],
  ['F', 'Fit the sketch in view'],
  ['Space + drag', 'Pan (dragging empty space pans too)'],
  ['Mouse wheel', 'Zoom around the pointer'],
  ['Ctrl+S, Ctrl+O', 'Save, open a sketch file'],
  ['?', 'This help'],
];
