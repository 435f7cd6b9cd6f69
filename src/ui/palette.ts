// Surface colours: our own set, chosen so neighbours differ in lightness as well
// as hue (readable with red-green colour blindness) and stay dark enough on the
// pale canvas. After eight surfaces the colours repeat with a dash pattern.
const COLOURS = ['#1f4e99', '#e0861a', '#8f3f97', '#2a9fb0', '#8a5a1c', '#cf5c8a', '#5d8fd6', '#3a3a3a'];
const DASHES: (number[] | undefined)[] = [undefined, [10, 4], [3, 3], [12, 3, 3, 3]];

export interface SurfaceStyle {
  colour: string;
  dash?: number[];
}

export function surfaceStyle(index: number): SurfaceStyle {
  return { colour: COLOURS[index % COLOURS.length], dash: DASHES[Math.floor(index / COLOURS.length) % DASHES.length] };
}

/** Marks for invalid geometry and selection: not a surface colour. */
export const MARK = {
  problem: '#c2185b',
  selection: '#111111',
  highlight: '#f2c200',
  grid: '#dcd8cc',
  axis: '#b9b2a0',
};
