/**
 * The worked-example chains of THEORY.md section 2, whose h and sigma^2 are given there [calc]:
 * two states h = 0.394668712115, sigma^2 = 0.606682202706; three states h = 0.909034310233,
 * sigma^2 = 0.408273233087. Shared by the tests so every file checks the same matrices.
 */
export const TWO_STATE: number[][] = [
  [0.9, 0.1],
  [0.4, 0.6],
];

export const THREE_STATE: number[][] = [
  [0.5, 0.3, 0.2],
  [0.2, 0.6, 0.2],
  [0.1, 0.2, 0.7],
];

/**
 * An order-2 binary chain for the tests of higher-order sources: row r is the law of the next symbol
 * after the context r = 2 x_(t-2) + x_(t-1). Not a published example; its stationary law and
 * rates are computed in the tests from the lifted order-1 chain.
 */
export const ORDER_TWO: number[][] = [
  [0.8, 0.2],
  [0.3, 0.7],
  [0.6, 0.4],
  [0.1, 0.9],
];
