import { Header } from './chrome/Header';
import { Toolbar } from './chrome/Toolbar';
import { SafetyNote } from './chrome/SafetyNote';
import { Notices } from './chrome/Notices';
import { HelpOverlay } from './chrome/HelpOverlay';
import { SketchCanvas } from './canvas/SketchCanvas';
import { CanvasStatus } from './canvas/CanvasStatus';
import { MatrixPanel } from './matrix/MatrixPanel';
import { Inspector } from './inspector/Inspector';
import { useShortcuts } from './chrome/useShortcuts';
import { useFileDrop } from './chrome/useFileDrop';

export function App() {
  useShortcuts();
  useFileDrop();
  return (
    <div className="app">
      <Header />
      <main className="workspace">
        <section className="drawing" aria-label="Sketch">
          <Toolbar />
          <SketchCanvas />
          <CanvasStatus />
        </section>
        <aside className="side">
          <MatrixPanel />
          <Inspector />
        </aside>
      </main>
      <SafetyNote />
      <Notices />
      <HelpOverlay />
    </div>
  );
}
