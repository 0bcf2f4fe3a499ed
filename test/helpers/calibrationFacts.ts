import type { CalibrationModelFacts } from '../../src/core/calibration/calibrationResult';

/**
 * Facts of a fitted order-1 chain on two states, for tests of what is built around a calibration
 * (figures, the store); no estimate is checked against these numbers.
 */
export const ORDER_ONE_FACTS: CalibrationModelFacts = {
  order: 1,
  maxOrder: 2,
  capReason: 'test fixture',
  criterion: 'BIC',
  observations: 1000,
  scores: [],
  states: 2,
  transientStates: 0,
  droppedTransitions: 0,
  period: 1,
  entropyRate: 1,
  sigma2: 0.5,
  rule: '',
};
