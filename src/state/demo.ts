// First-start demo, a sketch of our own: the cross-section of a small
// heat-treating oven. A row of four round alloy tubes (exact circles) hangs
// between a gas-fired floor and a refractory roof with chamfered corners.
// Metres; temperatures in kelvin.
import type { SketchFile } from './sketchFile';

const TUBE_RADIUS = 0.1;
const TUBE_Y = 0.7;
const TUBE_X = [0.45, 0.95, 1.45, 1.95];

export const demoSketch: SketchFile = {
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [2.4, 0],
        [2.4, 1.2],
        [2.1, 1.5],
        [0.3, 1.5],
        [0, 1.2],
      ],
      surface: ['fired floor', 'side walls', 'refractory roof', 'refractory roof', 'refractory roof', 'side walls'],
    },
    ...TUBE_X.map((x, i) => ({
      kind: 'solid' as const,
      points: [],
      circle: { center: [x, TUBE_Y] as [number, number], radius: TUBE_RADIUS },
      surface: `tube ${i + 1}`,
    })),
  ],
  surfaces: {
    'fired floor': { emissivity: 0.85, temperature: 1250 },
    'refractory roof': { emissivity: 0.8, adiabatic: true },
    'side walls': { emissivity: 0.8, adiabatic: true },
    'tube 1': { emissivity: 0.7, temperature: 900 },
    'tube 2': { emissivity: 0.7, temperature: 900 },
    'tube 3': { emissivity: 0.7, temperature: 900 },
    'tube 4': { emissivity: 0.7, temperature: 900 },
  },
};
