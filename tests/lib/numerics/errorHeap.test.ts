import { describe, expect, it } from "vitest";
import { ErrorHeap } from "../../../lib/numerics/errorHeap.js";

describe("ErrorHeap", () => {
  it("ErrorHeap pops pieces in decreasing error order", () => {
    const heap = new ErrorHeap();
    const errors = [0.3, 5, 1e-9, 2, 2, 7.5, 0, 1];
    errors.forEach((error, i) => heap.push({ lo: i, hi: i + 1, value: 0, error, resabs: 0 }));
    expect(heap.size).toBe(errors.length);
    expect(heap.peek()!.error).toBe(7.5);
    const popped: number[] = [];
    while (heap.size > 0) popped.push(heap.pop()!.error);
    expect(popped).toEqual([...errors].sort((a, b) => b - a));
    expect(heap.pop()).toBeUndefined();
  });
});
