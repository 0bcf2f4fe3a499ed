import { describe, expect, it } from 'vitest';
import { previewHead } from '../../../src/core/sequence/previewHead';
import { previewView, visibleText } from '../../../src/ui/view/previewView';

const bytes = (text: string): Uint8Array => new TextEncoder().encode(text);

describe('previewView', () => {
  it('makes control characters visible as control pictures and leaves markup as plain text', () => {
    expect(visibleText('a\tb\u0000c\u007f')).toBe('a\u2409b\u2400c\u2421');
    expect(visibleText('<b>x</b>')).toBe('<b>x</b>');
  });

  it('labels counts of a head by its size and gives the estimate for the whole file', () => {
    const head = bytes('0 1 1\n'.repeat(20_000));
    // by hand: 10,922 whole lines of 6 bytes in 64 KiB hold 32,766 symbols; the file of 2 x 20,000
    // lines holds 120,000, and 32,766 x 240,000 / 65,532 = 120,000 exactly
    const model = previewHead(head, 2 * head.length, 'coin.txt', { format: 'auto' });
    const view = previewView({ kind: 'ready', name: 'coin.txt', model });
    if (view.kind !== 'ready') throw new Error('expected a ready preview');
    expect(view.scope).toBe('in the first 64.0 KiB');
    expect(view.symbolsLine).toMatch(/^32,766 symbols in the first 64\.0 KiB; about 120,000 in the whole file \(234\.4 KiB\), estimated from its size\.$/);
    expect(view.alphabetCaption).toBe('Alphabet in the first 64.0 KiB: 2 symbols. Counts for the whole file come with the result.');
    expect(view.alphabet[0]).toEqual({ symbol: '1', spoken: '1', count: '21,844', share: '66.7%' });
    expect(view.formatLine).toBe('Reading as characters; the guess for this file is characters.');
  });

  it('says when the chosen format differs from the guess, shows spaces as symbols and passes warnings on', () => {
    const text = 'ab c\nd ef\n';
    const model = previewHead(bytes(text), text.length, 'x.txt', { format: 'chars', keepWhitespace: true });
    const view = previewView({ kind: 'ready', name: 'x.txt', model });
    if (view.kind !== 'ready') throw new Error('expected a ready preview');
    expect(view.formatLine).toBe('Reading as characters (chosen); the guess for this file is tokens.');
    expect(view.alphabet.find((r) => r.spoken === 'space')?.symbol).toBe('\u2420');
    expect(view.scope).toBe('in the whole file');
    const failed = previewView({ kind: 'failed', name: 'x', message: 'the file could not be read' });
    expect(failed).toEqual({ kind: 'failed', title: 'Preview of x', message: 'the file could not be read' });
  });
});
