// Rectangle tool: drag from corner to corner. Kernel: quickShapes.
import { twoPointTool, makesSetting } from './twoPointTool';
import { rectangleFromCorners } from './quickShapes';

export const rectangleTool = twoPointTool({
  id: 'rectangle',
  label: 'Rectangle',
  shortcut: 'r',
  hint: 'Drag from corner to corner (or click twice)',
  stem: 'body',
  settings: [makesSetting],
  outline: (a, b) => rectangleFromCorners(a, b),
});
