/** One row of a symbol count table; `spoken` names a symbol a screen reader would not read out (a space, a tab). */
export interface SymbolCountRow {
  readonly symbol: string;
  readonly spoken?: string;
  readonly count: string;
  readonly share: string;
}

/** A scrollable table of symbols with their counts and shares, as the views formatted them. */
export function SymbolCountTable({
  rows,
  caption,
  regionLabel,
  testId,
}: {
  readonly rows: readonly SymbolCountRow[];
  readonly caption: string;
  readonly regionLabel: string;
  readonly testId?: string;
}) {
  return (
    <div className="table-scroll small" tabIndex={0} role="region" aria-label={regionLabel}>
      <table className="compact" data-testid={testId}>
        <caption>{caption}</caption>
        <thead>
          <tr>
            <th scope="col">Symbol</th>
            <th scope="col" className="num">
              Count
            </th>
            <th scope="col" className="num">
              Share
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.symbol}>
              <th scope="row" className="symbol">
                {row.spoken === undefined ? row.symbol : <span aria-label={row.spoken}>{row.symbol}</span>}
              </th>
              <td className="num">{row.count}</td>
              <td className="num">{row.share}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
