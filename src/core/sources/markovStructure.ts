/**
 * The communicating structure of a finite Markov chain, from the pattern of positive transition
 * probabilities (row-major n*n). Irreducible chains have one class; we also accept "unichains" with
 * one closed class plus transient states (they arise when a higher-order chain forbids some
 * contexts), because the stationary law is still unique and puts no mass on the transient states.
 */
export interface ChainStructure {
  /** Number of closed (recurrent) communicating classes; 1 for a chain with a unique stationary law. */
  readonly closedClasses: number;
  /** recurrent[i] = 1 when state i lies in a closed class. */
  readonly recurrent: Uint8Array;
  /** Period of the closed class when there is exactly one (1 = aperiodic), else 0. */
  readonly period: number;
}

function gcd(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y !== 0) {
    const t = x % y;
    x = y;
    y = t;
  }
  return x;
}

/**
 * Strongly connected components by Kosaraju's two-pass depth-first search (Aho, Hopcroft & Ullman,
 * Data Structures and Algorithms, 1983, from memory), then the closed ones (no edge leaving) and the
 * period of the closed class as the gcd of level[u] + 1 - level[v] over its edges for breadth-first
 * levels from any of its states (standard, from memory).
 */
export function chainStructure(transitions: Float64Array, n: number): ChainStructure {
  // Adjacency in compressed rows, forward and reversed.
  const outStart = new Int32Array(n + 1);
  const inStart = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (transitions[i * n + j] > 0) {
        outStart[i + 1]++;
        inStart[j + 1]++;
      }
    }
  }
  for (let i = 0; i < n; i++) {
    outStart[i + 1] += outStart[i];
    inStart[i + 1] += inStart[i];
  }
  const outAdj = new Int32Array(outStart[n]);
  const inAdj = new Int32Array(inStart[n]);
  const outFill = outStart.slice(0, n);
  const inFill = inStart.slice(0, n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (transitions[i * n + j] > 0) {
        outAdj[outFill[i]++] = j;
        inAdj[inFill[j]++] = i;
      }
    }
  }

  // Pass 1: finishing order on the forward graph (iterative DFS with an explicit edge cursor).
  const order = new Int32Array(n);
  let orderLength = 0;
  const visited = new Uint8Array(n);
  const stack = new Int32Array(n);
  const cursor = new Int32Array(n);
  for (let root = 0; root < n; root++) {
    if (visited[root]) continue;
    let top = 0;
    stack[0] = root;
    visited[root] = 1;
    cursor[root] = outStart[root];
    while (top >= 0) {
      const v = stack[top];
      if (cursor[v] < outStart[v + 1]) {
        const w = outAdj[cursor[v]++];
        if (!visited[w]) {
          visited[w] = 1;
          cursor[w] = outStart[w];
          stack[++top] = w;
        }
      } else {
        order[orderLength++] = v;
        top--;
      }
    }
  }

  // Pass 2: components on the reversed graph in decreasing finishing time.
  const component = new Int32Array(n).fill(-1);
  let components = 0;
  for (let k = n - 1; k >= 0; k--) {
    const root = order[k];
    if (component[root] >= 0) continue;
    let top = 0;
    stack[0] = root;
    component[root] = components;
    while (top >= 0) {
      const v = stack[top--];
      for (let e = inStart[v]; e < inStart[v + 1]; e++) {
        const w = inAdj[e];
        if (component[w] < 0) {
          component[w] = components;
          stack[++top] = w;
        }
      }
    }
    components++;
  }

  const leaves = new Uint8Array(components);
  for (let i = 0; i < n; i++) {
    for (let e = outStart[i]; e < outStart[i + 1]; e++) {
      if (component[outAdj[e]] !== component[i]) leaves[component[i]] = 1;
    }
  }
  let closedClasses = 0;
  let closedId = -1;
  for (let c = 0; c < components; c++) {
    if (!leaves[c]) {
      closedClasses++;
      closedId = c;
    }
  }
  const recurrent = new Uint8Array(n);
  for (let i = 0; i < n; i++) recurrent[i] = leaves[component[i]] ? 0 : 1;

  let period = 0;
  if (closedClasses === 1) {
    const level = new Int32Array(n).fill(-1);
    let start = 0;
    while (component[start] !== closedId) start++;
    level[start] = 0;
    const queue = new Int32Array(n);
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    while (head < tail) {
      const v = queue[head++];
      for (let e = outStart[v]; e < outStart[v + 1]; e++) {
        const w = outAdj[e];
        if (level[w] < 0) {
          level[w] = level[v] + 1;
          queue[tail++] = w;
        } else {
          period = gcd(period, level[v] + 1 - level[w]);
        }
      }
    }
  }
  return { closedClasses, recurrent, period };
}
