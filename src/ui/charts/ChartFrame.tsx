import './charts.css';
import { useId, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { PALETTE, markerPath, nearestStop, stepStop, type FigureModel } from '../../figures';
import { Legend } from './Legend';
import { PathCanvas } from './PathCanvas';

function axisTitle(label: string, unit: string): string {
  return unit === '' ? label : `${label} (${unit})`;
}

/**
 * Draws one figure model: SVG axes, bands, lines and points (sample paths to a canvas underneath when
 * the model says so), a legend, and a read-out of the values at one block length that follows the
 * pointer and the arrow keys. Everything it draws comes from the model.
 */
export function ChartFrame({ model, testId }: { readonly model: FigureModel; readonly testId: string }) {
  const [index, setIndex] = useState(-1);
  const id = useId();
  const { size, plot, x, y } = model;
  const stop = index >= 0 ? model.readout[index] : undefined;
  const clip = `${id}-clip`;
  const layer = model.pathLayer;
  // A figure whose x axis is not the block length (e.g. a Q-Q plot) has no read-out stops.
  const hasReadout = model.readout.length > 0;

  const onPointer = (event: PointerEvent<SVGSVGElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    const px = ((event.clientX - box.left) * size.width) / Math.max(1, box.width);
    if (px < plot.left - 10 || px > plot.left + plot.width + 10) return;
    setIndex(nearestStop(model.readout, px));
  };
  const onKey = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === 'Escape') {
      setIndex(-1);
      return;
    }
    const next = stepStop(event.key, index, model.readout.length);
    if (next === null) return;
    event.preventDefault();
    setIndex(next);
  };
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;

  return (
    <figure className="chart" data-testid={testId}>
      <div
        className="chart-plot"
        tabIndex={hasReadout ? 0 : undefined}
        role="group"
        aria-label={hasReadout ? `${model.title}. Use the left and right arrow keys to read the values at each block length.` : model.title}
        aria-describedby={hasReadout ? `${id}-readout` : undefined}
        onKeyDown={onKey}
        style={{ height: size.height }}
      >
        {layer !== null && layer.render === 'canvas' && <PathCanvas model={model} layer={layer} />}
        <svg
          className="chart-svg"
          width={size.width}
          height={size.height}
          viewBox={`0 0 ${size.width} ${size.height}`}
          role="img"
          aria-labelledby={`${id}-title ${id}-desc`}
          onPointerMove={onPointer}
          onPointerLeave={() => setIndex(-1)}
        >
          <title id={`${id}-title`}>{model.title}</title>
          <desc id={`${id}-desc`}>{model.description}</desc>
          <defs>
            <clipPath id={clip}>
              <rect x={plot.left} y={plot.top} width={plot.width} height={plot.height} />
            </clipPath>
          </defs>
          <g className="grid" aria-hidden="true">
            {y.ticks.map((t) => (
              <line key={`gy${t.value}`} x1={plot.left} x2={right} y1={t.position} y2={t.position} />
            ))}
          </g>
          {model.spans.map((s) => (
            <rect key={s.id} className="span" x={s.from} y={plot.top} width={s.to - s.from} height={plot.height} fill={PALETTE.ink} data-mark="span" />
          ))}
          <g clipPath={`url(#${clip})`}>
            {model.bands.map((b) => (
              <path key={b.id} d={b.path} fill={PALETTE[b.colour]} opacity={b.opacity} data-mark="band" />
            ))}
            {layer !== null && layer.render === 'svg' && (
              <g stroke={PALETTE[layer.style.colour]} strokeWidth={layer.style.width} fill="none" opacity={0.7} data-mark="paths">
                {layer.paths.map((d, i) => (
                  <path key={i} d={d} />
                ))}
              </g>
            )}
            {model.lines.map((l) => (
              <path
                key={l.id}
                d={l.path}
                fill="none"
                stroke={PALETTE[l.style.colour]}
                strokeWidth={l.style.width}
                strokeDasharray={l.style.dash || undefined}
                strokeLinejoin="round"
                data-mark="line"
              />
            ))}
            {model.lines.map((l) =>
              l.style.marker === null || l.vertices.length === 0 ? null : (
                <g key={`m-${l.id}`} fill={PALETTE[l.style.colour]} stroke="#fff" strokeWidth={0.8} data-mark="markers">
                  {l.vertices.map((q, i) => (
                    <path key={i} d={markerPath(l.style.marker ?? 'circle', q.x, q.y, 7)} />
                  ))}
                </g>
              ),
            )}
            {model.points.map((p) =>
              p.style.marker === null ? null : (
                <g key={p.id} fill={PALETTE[p.style.colour]} stroke="#fff" strokeWidth={0.8} data-mark="points">
                  {p.points.map((q, i) => (
                    <path key={i} d={markerPath(p.style.marker ?? 'circle', q.x, q.y, 8)} />
                  ))}
                </g>
              ),
            )}
          </g>
          <g className="axis" aria-hidden="true">
            <line x1={plot.left} x2={right} y1={bottom} y2={bottom} />
            <line x1={plot.left} x2={plot.left} y1={plot.top} y2={bottom} />
            {x.ticks.map((t) => (
              <g key={`x${t.value}`}>
                <line x1={t.position} x2={t.position} y1={bottom} y2={bottom + 5} />
                <text x={t.position} y={bottom + 18} textAnchor="middle">
                  {t.label}
                </text>
              </g>
            ))}
            {y.ticks.map((t) => (
              <g key={`y${t.value}`}>
                <line x1={plot.left - 5} x2={plot.left} y1={t.position} y2={t.position} />
                <text x={plot.left - 8} y={t.position} dy="0.32em" textAnchor="end">
                  {t.label}
                </text>
              </g>
            ))}
            <text className="axis-title" x={plot.left + plot.width / 2} y={size.height - 8} textAnchor="middle" data-testid="x-axis-title">
              {axisTitle(x.label, x.unit)}
            </text>
            <text
              className="axis-title"
              transform={`translate(16 ${plot.top + plot.height / 2}) rotate(-90)`}
              textAnchor="middle"
              data-testid="y-axis-title"
            >
              {axisTitle(y.label, y.unit)}
            </text>
          </g>
          {stop !== undefined && <line className="cursor" x1={stop.x} x2={stop.x} y1={plot.top} y2={bottom} aria-hidden="true" />}
        </svg>
      </div>
      {hasReadout && (
        <div id={`${id}-readout`} className="chart-readout" aria-live="polite" data-testid="chart-readout">
          {stop === undefined ? (
            <span className="muted">{model.readout[0]?.heading === undefined ? 'Point at the plot, or focus it and use the arrow keys, to read the values at a block length.' : 'Point at the plot, or focus it and use the arrow keys, to read the values under the pointer.'}</span>
          ) : (
            <dl>
              {stop.heading === undefined ? (
                <div>
                  <dt>n</dt>
                  <dd data-testid="readout-n">{stop.n}</dd>
                </div>
              ) : (
                <div>
                  <dt>{stop.heading.label}</dt>
                  <dd data-testid="readout-x">{stop.heading.value}</dd>
                </div>
              )}
              {stop.rows.map((r) => (
                <div key={r.id}>
                  <dt>{r.label}</dt>
                  <dd>{r.value}</dd>
                </div>
              ))}
            </dl>
          )}
        </div>
      )}
      <Legend entries={model.legend} label={`Legend: ${model.title}`} />
      {model.notes.length > 0 && (
        <ul className="chart-notes">
          {model.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </figure>
  );
}
