import { describe, expect, it } from 'vitest';
import { sessionFileName } from '../../../src/ui/view/sessionFileName';

describe('sessionFileName', () => {
  it('appends .returnrate-session.json and replaces each run of characters file systems refuse by one underscore', () => {
    expect(sessionFileName('walk.txt')).toBe('walk.txt.returnrate-session.json');
    expect(sessionFileName('a/b\\c:"d"<script>\n.txt')).toBe('a_b_c_d_script_.txt.returnrate-session.json');
    expect(sessionFileName('Hill-top station wind sectors (invented)')).toBe('Hill-top station wind sectors (invented).returnrate-session.json');
    expect(sessionFileName('..')).toBe('analysis.returnrate-session.json');
    expect(sessionFileName('ünï€, 😀')).toBe('ünï€, 😀.returnrate-session.json');
  });
});
