// Rectangle tool: drag from corner to corner. Kernel: quickShapes.
import { twoPointTool, makesSetting } from './twoPointTool';
import { rectangleFromCorners } from './quickShapes';

export const rectangleTool = twoPointTool({
  id: 'rectangle',
  label: 'Rectangle',
  shortcut: 'r',
  hint: 'Drag from corner to corner (or click twice); or type x,y Enter for a corner, then width,height Enter',
  stem: 'body',
  settings: [makesSetting],
  outline: (a, b) => rectangleFromCorners(a, b),
  typed: (a, n) => {
    if (n.length !== 2) return { problem: 'type the width and height as width,height' };
    // 15 digits: 0.3 + 2.4 reads 2.7 as typed, not 2.6999999999999997.
    const far: [number, number] = [Number((a[0] + n[0]).toPrecision(15)), Number((a[1] + n[1]).toPrecision(15))];
    return rectangleFromCorners(a, far) ?? { problem: 'the width and height must not be 0' };
  },
});
