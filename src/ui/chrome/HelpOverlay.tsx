import { useEffect, useRef } from 'react';
import { useApp } from '../AppContext';
import { selectHelpOpen } from '../../state/selectors';
import { OTHER_KEYS } from './shortcuts';
import { toolRegistry } from '../../state/tools/registry';

const selectSetHelp = (s: { setHelpOpen: (o: boolean) => void }) => s.setHelpOpen;

export function HelpOverlay() {
  const open = useApp(selectHelpOpen);
  const setOpen = useApp(selectSetHelp);
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (open) close.current?.focus();
  }, [open]);
  if (!open) return null;
  return (
    <div className="overlay" onClick={() => setOpen(false)}>
      <div
        className="help"
        role="dialog"
        aria-modal="true"
        aria-labelledby="help-title"
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => {
          if (e.key === 'Escape') setOpen(false);
        }}
      >
        <h2 id="help-title">Drawing and shortcuts</h2>
        <p>
          Draw one enclosure (the walls, radiating inwards) and any number of bodies inside it (radiating outwards).
          Each drawn body or tube is one surface ("body 2", "tube 3"); the enclosure's sides are named by where they are
          (floor, roof, left wall, right wall). Split a surface into its edges or into equal parts, or join surfaces, in
          the Surfaces tab. Copy, repeat, flip and the tube row are in the Edit tab. The matrix updates while you drag.
        </p>
        <table className="keys">
          <caption>Keyboard shortcuts</caption>
          <tbody>
            {toolRegistry.tools.map((t) => (
              <tr key={t.id}>
                <th scope="row">
                  <kbd>{t.shortcut.toUpperCase()}</kbd>
                </th>
                <td>
                  <strong>{t.label}</strong>: {t.hint}
                </td>
              </tr>
            ))}
            {OTHER_KEYS.map(([k, what]) => (
              <tr key={k}>
                <th scope="row">
                  <kbd>{k}</kbd>
                </th>
                <td>{what}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <button ref={close} type="button" onClick={() => setOpen(false)}>
          Close
        </button>
      </div>
    </div>
  );
}
