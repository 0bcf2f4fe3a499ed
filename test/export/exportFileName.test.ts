import { describe, expect, it } from 'vitest';
import { exportFileName } from '../../src/export/exportFileName';

describe('exportFileName', () => {
  it('is the input name without its extension, then the figure id', () => {
    expect(exportFileName('heart-rate.csv', 'convergence', 'svg')).toBe('heart-rate_convergence.svg');
  });

  it('turns quotes, markup, spaces and path separators into dashes', () => {
    expect(exportFileName('"><script>alert(1)</script>.txt', 'return-law', 'csv')).toBe('script-alert-1-script_return-law.csv');
    expect(exportFileName('../../etc/pass wd', 'envelopes', '2x.png')).toBe('etc-pass-wd_envelopes.2x.png');
  });

  it('falls back to returnrate for a name with nothing usable', () => {
    expect(exportFileName('„“.txt', 'convergence', 'svg')).toBe('returnrate_convergence.svg');
  });
});
