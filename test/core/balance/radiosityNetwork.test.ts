import { describe, expect, it } from 'vitest';
import { RadiosityNetwork } from '../../../src/core/balance/radiosity';
import { mixedSection } from '../../bench/balanceScene';

// dG/dE of the balance's radiosity network: when the rows asked for are the
// columns' own surfaces (as Newton asks), only M^-1 among them is solved and
// the symmetry of the scaled system fills the rest. The same numbers, to
// rounding, as solving every row (asked for by adding one row).
describe('the radiosity network’s sensitivity', () => {
  it('at the columns’ own rows equals the general path', () => {
    const n = 90;
    const input = mixedSection(n, 3, 0.9);
    const eps = Float64Array.from(input.emissivity, (e) => Math.min(e, 0.99));
    const network = new RadiosityNetwork(input.viewFactors, input.area, eps, new Float64Array(n), 0);
    const cols = Int32Array.from({ length: n }, (_, i) => i).filter((i) => i % 4 !== 1);
    const own = network.sensitivity(cols, cols);
    const general = network.sensitivity(Int32Array.from([...cols, 1]), cols); // one row more: every row solved
    const u = cols.length;
    let big = 0;
    for (let k = 0; k < u * u; k++) big = Math.max(big, Math.abs(general[k]));
    // Both are backward-stable solves of a well-conditioned system (diagonally dominant): agreement to ~1e-13.
    for (let k = 0; k < u * u; k++) expect(Math.abs(own[k] - general[k])).toBeLessThanOrEqual(1e-12 * big);
    // dG_i/dE_k >= 0 (more emission anywhere never lowers any irradiation).
    for (let k = 0; k < u * u; k++) expect(own[k]).toBeGreaterThanOrEqual(-1e-15 * big);
  });
});
