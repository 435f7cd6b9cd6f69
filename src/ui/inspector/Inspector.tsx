import { useId, useState, type KeyboardEvent } from 'react';
import { SelectionPanel } from './SelectionPanel';
import { SurfacesPanel } from './SurfacesPanel';
import { SketchSettings } from './SketchSettings';
import { ExchangeSlot } from '../exchange/ExchangeSlot';
import { ReportPanel } from '../report/ReportPanel';
import { StudyPanel } from '../study/StudyPanel';

const TABS = [
  {
    id: 'selection',
    label: 'Edit',
    title: 'Coordinates, lengths and actions for what is selected',
    Panel: SelectionPanel,
  },
  { id: 'surfaces', label: 'Surfaces', title: 'Named surfaces: rename, group, split', Panel: SurfacesPanel },
  { id: 'sketch', label: 'Sketch', title: 'Units of the sketch', Panel: SketchSettings },
  {
    id: 'exchange',
    label: 'Heat exchange',
    title: 'Surface properties and net heat (gray-diffuse)',
    Panel: ExchangeSlot,
  },
  {
    id: 'study',
    label: 'What if',
    title: 'Vary one input over a range, or aim a result at a value',
    Panel: StudyPanel,
  },
  { id: 'report', label: 'Report', title: 'Printable report, and the picture as SVG or PNG', Panel: ReportPanel },
] as const;

export function Inspector() {
  const [tab, setTab] = useState<(typeof TABS)[number]['id']>('selection');
  const base = useId();
  const current = TABS.find((t) => t.id === tab)!;
  const onKey = (e: KeyboardEvent) => {
    const i = TABS.findIndex((t) => t.id === tab);
    if (e.key === 'ArrowRight') setTab(TABS[(i + 1) % TABS.length].id);
    if (e.key === 'ArrowLeft') setTab(TABS[(i + TABS.length - 1) % TABS.length].id);
  };
  return (
    <section className="panel inspector" aria-label="Inspector">
      <div className="tabs" role="tablist" aria-label="Inspector sections" onKeyDown={onKey}>
        {TABS.map((t) => (
          <button
            key={t.id}
            type="button"
            role="tab"
            id={`${base}-${t.id}`}
            aria-selected={tab === t.id}
            aria-controls={`${base}-panel`}
            tabIndex={tab === t.id ? 0 : -1}
            title={t.title}
            onClick={() => setTab(t.id)}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div className="tab-panel" role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-${tab}`}>
        <current.Panel />
      </div>
    </section>
  );
}
