import { useMemo, useState } from 'react';
import { DEMO_SCENARIOS } from '../../../workers/demoScenarios';
import { runner } from '../runner';
import { DEMO_LENGTH_RANGE } from '../store/inputSlice';
import { setDemoLength, useAppState } from '../store/store';
import { galleryView } from '../view/galleryView';
import { parseDemoLength } from '../view/inputOptions';

/** Reference sources with exact values and invented stories, generated in the worker; choosing one makes it the next run's input. */
export function GalleryPanel() {
  const unit = useAppState((s) => s.settings.unit);
  const chosen = useAppState((s) => s.chosen);
  const demoLength = useAppState((s) => s.demoLength);
  const items = useMemo(() => galleryView(DEMO_SCENARIOS, unit), [unit]);
  const [lengthText, setLengthText] = useState<string | null>(null);
  const shownLength = lengthText ?? String(demoLength);
  const lengthValid = parseDemoLength(shownLength) !== null;
  const chosenId = chosen?.kind === 'demo' ? chosen.id : null;

  return (
    <section className="panel" aria-labelledby="gallery-heading">
      <h2 id="gallery-heading">Demo gallery</h2>
      <p className="hint">
        Generated in this tab from a fixed seed. Reference sources show their exact h and σ²; stories marked invented are ours, not measurements.
      </p>
      <label className="field gallery-length">
        <span>Symbols</span>
        <input
          type="number"
          inputMode="numeric"
          min={DEMO_LENGTH_RANGE[0]}
          max={DEMO_LENGTH_RANGE[1]}
          step={1000}
          value={shownLength}
          aria-invalid={!lengthValid}
          onChange={(event) => {
            const text = event.currentTarget.value;
            const length = parseDemoLength(text);
            setLengthText(length === null ? text : null);
            if (length !== null) setDemoLength(length);
          }}
        />
      </label>
      <ul className="gallery" aria-label="Demos">
        {items.map((item) => {
          const selected = item.id === chosenId;
          return (
            <li key={item.id} className={selected ? 'gallery-item is-chosen' : 'gallery-item'}>
              <div className="gallery-head">
                <span className="gallery-title">{item.title}</span>
                <span className={item.invented ? 'tag tag-invented' : 'tag'}>{item.badge}</span>
              </div>
              <p className="gallery-story">{item.story}</p>
              <div className="gallery-foot">
                <p className="gallery-facts">
                  <span>
                    h = <span data-testid={`gallery-h-${item.id}`}>{item.entropy}</span>
                  </span>
                  <span>σ² = {item.sigma2}</span>
                </p>
                <button
                  type="button"
                  className="secondary small"
                  aria-pressed={selected}
                  aria-label={`Choose ${item.title}`}
                  title={item.description}
                  onClick={() => runner.chooseDemo(item.id)}
                >
                  {selected ? 'Chosen' : 'Choose'}
                </button>
              </div>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
