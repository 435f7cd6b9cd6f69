import { useApp } from '../AppContext';
import { selectDigits, selectHoverPair, selectShown, selectUnits } from '../../state/selectors';
import { matrixView, RESIDUAL_TOLERANCE } from '../../state/matrixView';
import type { AppState } from '../../state/store';
import { useSurfaceColours } from '../canvas/useSurfaceColours';
import { useSelectedSurfaces } from '../canvas/useSelectedSurfaces';
import { MatrixTable } from './MatrixTable';
import { MatrixControls } from './MatrixControls';
import { ResultStatus } from './ResultStatus';
import { fmtResidual } from './format';

const selectSetHover = (s: AppState) => s.setHoverPair;

export function MatrixPanel() {
  const shown = useApp(selectShown);
  const digits = useApp(selectDigits);
  const docUnits = useApp(selectUnits);
  const hoverPair = useApp(selectHoverPair);
  const stale = shown?.stale ?? false;
  const setHover = useApp(selectSetHover);
  const selected = useSelectedSurfaces();
  const order = useSurfaceColours();
  const view = shown ? matrixView(shown) : null;
  const units = shown?.units ?? docUnits;
  const recipBad = view ? view.reciprocityResidual > RESIDUAL_TOLERANCE : false;
  const rowBad = view ? view.worstRowResidual > RESIDUAL_TOLERANCE : false;
  return (
    <section className="panel matrix-panel" aria-labelledby="matrix-title">
      <div className="panel-head">
        <h2 id="matrix-title">View factors</h2>
        <ResultStatus />
      </div>
      <MatrixControls shown={shown} view={view} digits={digits} />
      <div className="matrix-scroll">
        {view ? (
          <MatrixTable
            view={view}
            digits={digits}
            units={units}
            order={order}
            selected={selected}
            hoverPair={hoverPair}
            onHover={setHover}
            stale={stale}
          />
        ) : (
          <p className="empty">No results to show.</p>
        )}
      </div>
      {view && (
        <div id="matrix-notes" className="matrix-notes">
          <span
            className={recipBad ? 'warn' : undefined}
            title="Largest |L_i F_ij − L_j F_ji| relative to the larger term, over all pairs"
          >
            reciprocity residual (largest): {fmtResidual(view.reciprocityResidual)}
            {recipBad ? ' — above rounding, cells marked ⚠' : ''}
          </span>
          {view.closed ? (
            <span className={rowBad ? 'warn' : undefined}>
              largest row-sum residual: {fmtResidual(view.worstRowResidual)}
              {rowBad ? ' — above rounding' : ''}
            </span>
          ) : (
            <span>open sketch: the last column is the factor to the surroundings</span>
          )}
        </div>
      )}
    </section>
  );
}
