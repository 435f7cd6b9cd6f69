// Tube tool: a regular polygon from the centre out to the radius, with the
// number of sides set beside the tools. Kernel: quickShapes.
import { twoPointTool, makesSetting } from './twoPointTool';
import { regularPolygon } from './quickShapes';
import type { ToolSetting } from './tool';
import { TUBE_SIDES_RULE } from '../edits/numberInput';

const sidesSetting: ToolSetting = {
  type: 'integer',
  label: 'sides',
  title: 'Number of sides of the tube polygon (3 to 256)',
  rule: TUBE_SIDES_RULE,
  read: (s) => s.tubeSides,
  write: (s, n) => s.setTubeSides(n),
};

export const tubeTool = twoPointTool({
  id: 'tube',
  label: 'Tube',
  shortcut: 't',
  hint: 'Drag from the centre out to the radius; or type x,y Enter for the centre, then the diameter (or a radius ending in r) Enter; sides are set beside the tools',
  stem: 'tube',
  settings: [makesSetting, sidesSetting],
  outline: (centre, rim, s) => regularPolygon(centre, rim, s.tubeSides),
  entryLetters: 'r',
  // Typed sizes are exact: the rim is at centre + radius along +x, not snapped.
  typed: (c, n, entry, s) => {
    if (n.length !== 1) return { problem: 'type one number: the diameter, or a radius ending in r' };
    const radius = /r$/i.test(entry) ? n[0] : n[0] / 2;
    if (!(radius > 0)) return { problem: 'the diameter must be greater than 0' };
    return regularPolygon(c, [c[0] + radius, c[1]], s.tubeSides) ?? { problem: 'the tube has no size' };
  },
});
