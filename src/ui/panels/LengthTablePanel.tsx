import { useMemo } from 'react';
import { lengthRowsView, lengthTableView, type LengthTableView } from '../view/lengthTableView';
import { partialLabel } from '../view/partialLabel';
import { useStaggeredRun } from './useStaggeredRun';

function LengthTable({ view, partial }: { readonly view: LengthTableView; readonly partial: string | null }) {
  return (
    <div className="table-scroll" tabIndex={0} role="region" aria-label="Per block length table, scrollable">
      <table className="compact lengths" data-testid="length-table" data-partial={partial !== null}>
        <caption>
          {partial !== null ? (
            <span className="partial-note" data-testid="length-table-partial">
              {partial}
            </span>
          ) : (
            <>One row per block length n; rows marked ● form the trusted range of the return-time estimators. </>
          )}
          {' '}Entropies in {view.unit}/symbol, log R in nats.
        </caption>
        <thead>
          <tr>
            <th scope="col">n</th>
            <th scope="col">
              <span className="visually-hidden">Trusted</span>
            </th>
            <th scope="col">Positions</th>
            <th scope="col">Censored</th>
            <th scope="col">Mean log R</th>
            <th scope="col">Mean log R / n</th>
            <th scope="col">H_n − H_(n−1)</th>
            <th scope="col">Distinct blocks</th>
          </tr>
        </thead>
        <tbody>
          {view.rows.map((r) => (
            <tr key={r.n} className={r.inTrustedRange ? 'trusted' : undefined}>
              <th scope="row" className="num">
                {r.n}
              </th>
              <td className="mark">
                {r.inTrustedRange && (
                  <>
                    <span aria-hidden="true">●</span>
                    <span className="visually-hidden">trusted</span>
                  </>
                )}
              </td>
              <td className="num">{r.positions}</td>
              <td className="num">{r.censored}</td>
              <td className="num">{r.meanLogReturn}</td>
              <td className="num">{r.ratePerSymbol}</td>
              <td className="num">{r.conditionalEntropy}</td>
              <td className="num">{r.distinctBlocks}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The compact per-n table: the running run's rows as they arrive (or a cancelled run's), else the last result's. */
export function LengthTablePanel() {
  // Its own task when the run ends (the table is rebuilt from the final rows), like the figures.
  const { result, partial } = useStaggeredRun();
  const view = useMemo(() => {
    if (partial !== null) return lengthRowsView(partial.rows, null, partial.unit);
    return result === null ? null : lengthTableView(result);
  }, [partial, result]);
  const label = partial === null ? null : partialLabel(partial);
  let body;
  if (view === null) body = <p className="muted">The per-n table appears with the first result.</p>;
  else if (view.rows.length === 0) body = <p className="muted partial-note" data-testid="length-table-partial">{label}</p>;
  else body = <LengthTable view={view} partial={label} />;
  return (
    <section className="panel" aria-labelledby="lengths-heading" aria-busy={partial?.status === 'running'}>
      <h2 id="lengths-heading">By block length</h2>
      {body}
    </section>
  );
}
