import { describe, expect, it } from 'vitest';
import { cautionColumns, physiologicalCaution } from '../../../src/ui/view/cautionView';

describe('physiologicalCaution', () => {
  it('names the research-estimate caution for a physiological file name, CSV column or CSV header', () => {
    expect(physiologicalCaution({ name: 'ecg-lead-2.txt', format: 'chars' })).toMatch(/research estimate, not a clinical measurement/);
    expect(physiologicalCaution({ name: 'run7.csv', format: 'csv' }, cautionColumns('csv', 'EEG_Fz'))).not.toBeNull();
    expect(physiologicalCaution({ name: 'run7.csv', format: 'csv' }, cautionColumns('csv', '', 'time,pulse_bpm'))).not.toBeNull();
  });

  it('stays silent for other data, and ignores the CSV column of a file read in another format', () => {
    expect(physiologicalCaution({ name: 'wind-sectors.txt', format: 'chars' })).toBeNull();
    expect(physiologicalCaution({ name: 'run7.csv', format: 'csv' }, cautionColumns('csv', 'sector', 'time,sector'))).toBeNull();
    expect(cautionColumns('chars', 'EEG_Fz', 'EEG')).toEqual([]);
  });
});
