import { useMemo } from 'react';
import type { AnalysisResult } from '../../core';
import { useAppState } from '../store/store';
import { lengthTableView } from '../view/lengthTableView';

function LengthTable({ result }: { readonly result: AnalysisResult }) {
  const view = useMemo(() => lengthTableView(result), [result]);
  return (
    <div className="table-scroll" tabIndex={0} role="region" aria-label="Per block length table, scrollable">
      <table className="compact lengths">
        <caption>
          One row per block length n; rows marked ● form the trusted range of the return-time estimators. Entropies in {view.unit}/symbol,
          log R in nats.
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

/** The compact per-n table of the last result. */
export function LengthTablePanel() {
  const result = useAppState((s) => s.result);
  return (
    <section className="panel" aria-labelledby="lengths-heading">
      <h2 id="lengths-heading">By block length</h2>
      {result === null ? <p className="muted">The per-n table appears with the first result.</p> : <LengthTable result={result} />}
    </section>
  );
}
