/**
 * Max-heap of integration subintervals keyed on their error estimate: adaptive quadrature always
 * bisects the interval that contributes most to the global error (QUADPACK keeps a sorted list for the
 * same purpose; a binary heap makes each step O(log n)).
 */

export interface Piece {
  lo: number;
  hi: number;
  value: number;
  error: number;
  resabs: number;
}

export class ErrorHeap {
  private readonly items: Piece[] = [];

  get size(): number {
    return this.items.length;
  }

  all(): readonly Piece[] {
    return this.items;
  }

  push(piece: Piece): void {
    const items = this.items;
    items.push(piece);
    let i = items.length - 1;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (items[parent]!.error >= piece.error) break;
      items[i] = items[parent]!;
      i = parent;
    }
    items[i] = piece;
  }

  peek(): Piece | undefined {
    return this.items[0];
  }

  pop(): Piece | undefined {
    const items = this.items;
    const top = items[0];
    const last = items.pop();
    if (top === undefined || last === undefined || items.length === 0) return top;
    let i = 0;
    const n = items.length;
    for (;;) {
      const left = 2 * i + 1;
      if (left >= n) break;
      const right = left + 1;
      const child = right < n && items[right]!.error > items[left]!.error ? right : left;
      if (items[child]!.error <= last.error) break;
      items[i] = items[child]!;
      i = child;
    }
    items[i] = last;
    return top;
  }
}
