import { type DisplaySystem, fromSi, toSi, unitLabel } from '../../lib/units/display';

interface SelectionControlsProps {
  system: DisplaySystem;
  depth: { min?: number; max?: number };
  quality: number[];
  weighting: 'equal' | 'byClass';
  onChange: (change: { depth?: { min?: number; max?: number }; quality?: number[]; weighting?: 'equal' | 'byClass' }) => void;
}

const QUALITY_LABELS: Record<number, string> = { 1: '1 very good', 2: '2 good to fair', 3: '3 poor', 4: '4 very poor' };

/** Depth range (in the person's units), sample quality classes and weighting of the statistics. */
export default function SelectionControls({ system, depth, quality, weighting, onChange }: SelectionControlsProps) {
  const unit = unitLabel('length', system);
  const shown = (m: number | undefined) => (m === undefined ? '' : String(Number(fromSi(m, 'length', system).toPrecision(4))));
  return (
    <form
      className="panel flex flex-wrap items-end gap-4 p-3 text-sm"
      aria-label="Narrow the selection"
      onSubmit={(event) => {
        event.preventDefault();
        const form = new FormData(event.currentTarget);
        const read = (name: string) => {
          const text = String(form.get(name) ?? '').trim();
          const value = Number(text);
          return text === '' || !Number.isFinite(value) ? undefined : toSi(value, 'length', system);
        };
        const min = read('depthFrom');
        const max = read('depthTo');
        onChange({ depth: min !== undefined && max !== undefined && min > max ? { min: max, max: min } : { min, max } });
      }}
    >
      <fieldset className="flex items-end gap-2">
        <legend className="text-xs text-ink-600">Depth of the specimen top ({unit} below ground)</legend>
        <label className="flex flex-col text-xs text-ink-600">
          from
          <input
            name="depthFrom"
            type="number"
            step="any"
            min="0"
            defaultValue={shown(depth.min)}
            className="w-24 rounded border border-ink-200 px-2 py-1 text-sm"
            data-testid="depth-from"
          />
        </label>
        <label className="flex flex-col text-xs text-ink-600">
          to
          <input
            name="depthTo"
            type="number"
            step="any"
            min="0"
            defaultValue={shown(depth.max)}
            className="w-24 rounded border border-ink-200 px-2 py-1 text-sm"
            data-testid="depth-to"
          />
        </label>
        <button type="submit" className="btn-quiet" data-testid="apply-depth">
          Apply depth
        </button>
      </fieldset>
      <fieldset className="flex flex-wrap items-center gap-2">
        <legend className="text-xs text-ink-600">
          Sample quality (Lunne et al. 1997 classes; none ticked: all, including unknown)
        </legend>
        {[1, 2, 3, 4].map((c) => (
          <label key={c} className="flex items-center gap-1 text-xs">
            <input
              type="checkbox"
              checked={quality.includes(c)}
              onChange={(e) => onChange({ quality: e.target.checked ? [...quality, c].sort() : quality.filter((q) => q !== c) })}
            />
            {QUALITY_LABELS[c]}
          </label>
        ))}
      </fieldset>
      <label className="flex flex-col text-xs text-ink-600">
        Weighting
        <select
          className="rounded border border-ink-200 px-2 py-1 text-sm"
          value={weighting}
          onChange={(e) => onChange({ weighting: e.target.value as 'equal' | 'byClass' })}
          data-testid="weighting"
        >
          <option value="equal">every test counts once</option>
          <option value="byClass">by sample quality class</option>
        </select>
      </label>
    </form>
  );
}
