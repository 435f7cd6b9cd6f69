import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveBalance, type BalanceCondition } from '../../../src/core/balance';
import { mixedSection } from '../../bench/balanceScene';

// Property: over random sections with every kind of condition (held, heat
// flux, adiabatic, walls with and without casing radiation, tubes, linked
// plates, convection, open and closed), every surface's balance and the total
// energy balance hold to the solver's tolerance. Each term is recomputed here
// from the reported temperatures and radiosities with the textbook relations
// (net-radiation method: G = F J + F_s E_s, J = e E + (1 - e) G; plane and
// cylindrical wall resistances: Incropera et al., 6th ed., sec. 3.1 and 3.3.1,
// from memory), not read from the solver's own balance.

const SIGMA = 5.670374419e-8;
/** The solver's convergence tolerance, relative to the radiation leaving all surfaces (sum of A_i J_i). */
const TOL = 1e-10;

/** What the back supplies at temperature T (K), per m^2, recomputed here; undefined where the balance defines it. */
function backFlux(c: BalanceCondition, T: number): number | undefined {
  switch (c.kind) {
    case 'heatFlux':
      return c.heatFlux;
    case 'adiabatic':
      return 0;
    case 'tube': {
      const R =
        c.outerDiameter / (c.innerDiameter * c.insideCoefficient) +
        (c.outerDiameter * Math.log(c.outerDiameter / c.innerDiameter)) / (2 * c.wallConductivity);
      return -(T - c.fluidTemperature) / R;
    }
    case 'wall': {
      const Rl = c.layers.reduce((s, l) => s + l.thickness / l.conductivity, 0);
      const To = c.outsideTemperature;
      if (c.outsideEmissivity === undefined) return -(T - To) / (Rl + 1 / c.outsideCoefficient);
      const e = c.outsideEmissivity;
      // Casing temperature by bisection: (T - Tc)/Rl = h (Tc - To) + e sigma (Tc^4 - To^4).
      let lo = Math.min(T, To);
      let hi = Math.max(T, To);
      for (let k = 0; k < 200; k++) {
        const mid = 0.5 * (lo + hi);
        const f = (T - mid) / Rl - c.outsideCoefficient * (mid - To) - e * SIGMA * (mid ** 4 - To ** 4);
        if (f > 0) lo = mid;
        else hi = mid;
      }
      return -(T - 0.5 * (lo + hi)) / Rl;
    }
    default:
      return undefined;
  }
}

describe('the surface balance over random sections', () => {
  it('every surface balances and energy is conserved, to the tolerance', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 40 }),
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.constantFrom(1, 0.9, 0.5),
        (n, seed, closure) => {
          const input = mixedSection(n, seed, closure);
          const out = solveBalance(input);
          if (!out.ok) throw new Error(`no answer: ${out.code} (surface ${out.surface})`);
          const r = out.result;
          const F = input.viewFactors;
          const A = input.area;
          const Ts = input.surroundingsTemperature;
          const Es = Ts === undefined ? 0 : SIGMA * Ts ** 4;
          let radiated = 0;
          for (let i = 0; i < n; i++) radiated += A[i] * r.radiosity[i];
          const tol = TOL * radiated;
          let surroundings = 0;
          let gas = 0;
          for (let i = 0; i < n; i++) {
            const c = input.conditions[i];
            const T = r.temperature[i];
            expect(T).toBeGreaterThan(0);
            let G = 0;
            let rowSum = 0;
            for (let j = 0; j < n; j++) {
              G += F[i * n + j] * r.radiosity[j];
              rowSum += F[i * n + j];
            }
            G += (1 - rowSum) * Es;
            const e = input.emissivity[i];
            // Radiosity of a gray diffuse surface from its own temperature.
            expect(Math.abs(r.radiosity[i] - (e * SIGMA * T ** 4 + (1 - e) * G))).toBeLessThanOrEqual(
              1e-12 * r.radiosity[i] + tol / A[i],
            );
            const radiation = A[i] * e * (SIGMA * T ** 4 - G);
            const h = input.convectionCoefficient?.[i] ?? 0;
            const convection = A[i] * h * (T - (input.gasTemperature ?? 0));
            expect(Math.abs(r.netHeat[i] - radiation)).toBeLessThanOrEqual(tol);
            expect(Math.abs(r.convectionHeat[i] - convection)).toBeLessThanOrEqual(1e-12 * Math.abs(convection));
            const back = backFlux(c, T);
            // Heat supplied from behind = net radiation + convection leaving the front.
            if (back !== undefined) expect(Math.abs(A[i] * back - radiation - convection)).toBeLessThanOrEqual(tol);
            expect(Math.abs(r.suppliedHeat[i] - radiation - convection)).toBeLessThanOrEqual(tol);
            if (c.kind === 'linked') {
              expect(r.temperature[c.other]).toBe(T);
              if (c.other > i) expect(Math.abs(r.suppliedHeat[i] + r.suppliedHeat[c.other])).toBeLessThanOrEqual(tol);
            }
            // The surroundings take up what this surface sends them: A F_s (J - E_s).
            surroundings -= A[i] * (1 - rowSum) * (r.radiosity[i] - Es);
            gas -= convection;
          }
          // Every path: heat supplied from behind, by the gas, and by the surroundings, recomputed above.
          expect(Math.abs(gas - r.gasConvectionHeat)).toBeLessThanOrEqual(1e-12 * radiated);
          expect(Math.abs(surroundings - r.surroundingsNetHeat)).toBeLessThanOrEqual(1e-12 * radiated);
          let sum = surroundings + gas;
          for (let i = 0; i < n; i++) sum += r.suppliedHeat[i];
          expect(Math.abs(sum)).toBeLessThanOrEqual(n * tol);
          expect(r.energyBalance).toBeLessThanOrEqual(n * TOL);
        },
      ),
      { numRuns: 60 },
    );
  });
});
