// Tube tool: an exact circle from the centre out to the rim. The centre snaps
// to the grid; the radius is the pointer's distance, not snapped, or typed.
import { twoPointTool, makesSetting } from './twoPointTool';

export const tubeTool = twoPointTool({
  id: 'tube',
  label: 'Tube',
  shortcut: 't',
  hint: 'Drag from the centre out to the rim; or type x,y Enter for the centre, then the diameter (or a radius ending in r) Enter',
  stem: 'tube',
  settings: [makesSetting],
  freeSecond: true,
  outline: (centre, rim) => {
    const radius = Math.hypot(rim[0] - centre[0], rim[1] - centre[1]);
    return radius > 0 ? { center: centre, radius } : null;
  },
  entryLetters: 'r',
  typed: (c, n, entry) => {
    if (n.length !== 1) return { problem: 'type one number: the diameter, or a radius ending in r' };
    const radius = /r$/i.test(entry) ? n[0] : n[0] / 2;
    if (!(radius > 0) || !Number.isFinite(radius)) return { problem: 'the diameter must be greater than 0' };
    return { center: c, radius };
  },
});
