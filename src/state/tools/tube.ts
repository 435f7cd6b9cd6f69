// Tube tool: a regular polygon from the centre out to the radius, with the
// number of sides set beside the tools. Kernel: quickShapes.
import { twoPointTool, makesSetting } from './twoPointTool';
import { regularPolygon } from './quickShapes';
import type { ToolSetting } from './tool';

const sidesSetting: ToolSetting = {
  type: 'integer',
  label: 'sides',
  title: 'Number of sides of the tube polygon (3 to 256)',
  read: (s) => s.tubeSides,
  write: (s, n) => s.setTubeSides(n),
};

export const tubeTool = twoPointTool({
  id: 'tube',
  label: 'Tube',
  shortcut: 't',
  hint: 'Drag from the centre out to the radius; the number of sides is set beside the tools',
  stem: 'tube',
  settings: [makesSetting, sidesSetting],
  outline: (centre, rim, s) => regularPolygon(centre, rim, s.tubeSides),
});
