// The Report tab: the printable report (the command line's HTML, from what is on
// screen) and the picture of the sketch as SVG or PNG.
import { useId, useState } from 'react';
import { useApp, useAppStore, useDocumentApi } from '../AppContext';
import { appPictureSvg, appReport, canColourHeat } from '../../state/report/appReport';
import type { AppState } from '../../state/store';
import { downloadText } from '../chrome/download';
import { downloadBlob, svgToPng } from './png';
import './report.css';

const selectNotify = (s: AppState) => s.notify;
const SCALES = [1, 2, 3, 4] as const;

export function ReportPanel() {
  const id = useId();
  const store = useAppStore();
  const api = useDocumentApi();
  const notify = useApp(selectNotify);
  const heatReady = useApp(canColourHeat);
  const [names, setNames] = useState(true);
  const [dimensions, setDimensions] = useState(false);
  const [heat, setHeat] = useState(true);
  const [scale, setScale] = useState<number>(2);
  const [busy, setBusy] = useState(false);

  const makeReport = async (how: 'open' | 'download') => {
    setBusy(true);
    try {
      const report = await appReport(store, api);
      if (!report.ok) {
        notify('warning', report.message);
        return;
      }
      if (how === 'download') {
        downloadText(report.fileName, report.html, 'text/html');
        return;
      }
      const url = URL.createObjectURL(new Blob([report.html], { type: 'text/html' }));
      const opened = window.open(url, '_blank');
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
      if (!opened) notify('warning', 'The browser blocked the new tab; use Download report instead.');
    } catch (error) {
      notify('error', `No report: ${error instanceof Error ? error.message : 'the browser could not make it'}.`);
    } finally {
      setBusy(false);
    }
  };

  const svg = () => appPictureSvg(store.getState(), { names, dimensions, heat: heat && heatReady });
  const savePng = async () => {
    try {
      downloadBlob('sketch.png', await svgToPng(svg(), scale));
    } catch (error) {
      notify('warning', `No PNG: ${error instanceof Error ? error.message : 'the browser could not draw it'}.`);
    }
  };

  return (
    <div className="report-panel">
      <section aria-labelledby={`${id}-report`}>
        <h3 id={`${id}-report`}>Report</h3>
        <p className="hint">
          One HTML page with the picture, the inputs, the view factors and the heat exchange, the program version, the
          date and the SHA-256 of the sketch file; the same as <code>npm run cli -- report sketch.json</code>. Print it
          from the browser (one page for a small sketch).
        </p>
        <div className="report-buttons">
          <button
            type="button"
            disabled={busy}
            onClick={() => void makeReport('open')}
            title="Open the report in a new tab to read or print it"
          >
            Open report
          </button>
          <button
            type="button"
            disabled={busy}
            onClick={() => void makeReport('download')}
            title="Download the report as one HTML file"
          >
            Download report
          </button>
        </div>
      </section>
      <section aria-labelledby={`${id}-picture`}>
        <h3 id={`${id}-picture`}>Picture</h3>
        <fieldset className="report-options">
          <legend>Show</legend>
          <label>
            <input type="checkbox" checked={names} onChange={(e) => setNames(e.target.checked)} />
            surface names
          </label>
          <label>
            <input type="checkbox" checked={dimensions} onChange={(e) => setDimensions(e.target.checked)} />
            dimensions
          </label>
          <label
            title={
              heatReady
                ? 'Colours as the canvas colouring (net flux when it is off), with the legend'
                : 'No heat results to colour by'
            }
          >
            <input
              type="checkbox"
              checked={heat && heatReady}
              disabled={!heatReady}
              onChange={(e) => setHeat(e.target.checked)}
            />
            heat colours
          </label>
        </fieldset>
        <div className="report-buttons">
          <button
            type="button"
            onClick={() => downloadText('sketch.svg', svg(), 'image/svg+xml')}
            title="Download the picture as SVG"
          >
            Download SVG
          </button>
          <label>
            PNG scale{' '}
            <select value={scale} onChange={(e) => setScale(Number(e.target.value))} aria-label="PNG scale">
              {SCALES.map((k) => (
                <option key={k} value={k}>
                  {k}×
                </option>
              ))}
            </select>
          </label>
          <button type="button" onClick={() => void savePng()} title="Download the picture as PNG at the chosen scale">
            Download PNG
          </button>
        </div>
      </section>
    </div>
  );
}
