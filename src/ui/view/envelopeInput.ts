import { envelopeOptionProblems, type EnvelopeField, type EnvelopeOptions } from '../../figures';

/**
 * A typed envelope option checked against its rule: the number, or the message to show. Empty text
 * and text that is not a plain decimal number get their own message.
 */
export function parseEnvelopeField(field: EnvelopeField, text: string, current: EnvelopeOptions): { value: number } | { message: string } {
  const name = field === 'errorC' ? 'C' : field === 'delta' ? 'δ' : 'z';
  const trimmed = text.trim();
  if (trimmed === '') return { message: `Enter a value for ${name}.` };
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(trimmed)) return { message: `${name} must be a number, e.g. ${current[field]}; got “${trimmed}”.` };
  const value = Number(trimmed);
  const problem = envelopeOptionProblems({ ...current, [field]: value })[field];
  return problem === undefined ? { value } : { message: problem };
}
