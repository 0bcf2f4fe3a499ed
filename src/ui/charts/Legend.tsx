import { BAND_OPACITY, PALETTE, markerPath, type LegendEntry } from '../../figures';

function Swatch({ entry }: { readonly entry: LegendEntry }) {
  const colour = PALETTE[entry.colour];
  const style = entry.style;
  return (
    <svg width="34" height="14" viewBox="0 0 34 14" aria-hidden="true" className="legend-swatch">
      {entry.kind === 'span' && <rect x="1" y="1" width="32" height="12" fill={colour} opacity={0.08} stroke={colour} strokeOpacity={0.35} />}
      {entry.kind === 'band' && <rect x="1" y="2" width="32" height="10" fill={colour} opacity={BAND_OPACITY * 1.8} />}
      {style !== null && entry.kind !== 'span' && (
        <line x1="2" y1="7" x2="32" y2="7" stroke={PALETTE[style.colour]} strokeWidth={Math.max(style.width, 1.2)} strokeDasharray={style.dash || undefined} />
      )}
      {style?.marker != null && <path d={markerPath(style.marker, 17, 7)} fill={PALETTE[style.colour]} stroke="#fff" strokeWidth={0.8} />}
    </svg>
  );
}

/** The figure's legend: one swatch (colour and dash or marker) and label per series. */
export function Legend({ entries, label }: { readonly entries: readonly LegendEntry[]; readonly label: string }) {
  return (
    <ul className="chart-legend" aria-label={label}>
      {entries.map((e) => (
        <li key={`${e.kind}-${e.id}`}>
          <Swatch entry={e} />
          <span>{e.label}</span>
        </li>
      ))}
    </ul>
  );
}
