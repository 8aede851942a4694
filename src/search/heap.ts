/**
 * A binary min-heap with a caller's comparison. Items move by plain assignments (no destructuring
 * swap: before the JIT has compiled it, a swap by destructuring builds and iterates an array).
 */
export class MinHeap<T> {
  private items: T[] = [];
  constructor(private readonly less: (a: T, b: T) => boolean) {}

  get size(): number {
    return this.items.length;
  }

  push(item: T): void {
    const a = this.items;
    let i = a.length;
    a.push(item);
    // Sift up: parents larger than the item move down one level; the item fills the last hole.
    while (i > 0) {
      const parent = (i - 1) >> 1;
      const above = a[parent]!;
      if (!this.less(item, above)) break;
      a[i] = above;
      i = parent;
    }
    a[i] = item;
  }

  pop(): T | undefined {
    const a = this.items;
    if (a.length === 0) return undefined;
    const top = a[0]!;
    const last = a.pop()!;
    const n = a.length;
    if (n > 0) {
      // Sift down: the smaller child moves up one level while it is below the last item.
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        if (l >= n) break;
        const r = l + 1;
        const child = r < n && this.less(a[r]!, a[l]!) ? r : l;
        if (!this.less(a[child]!, last)) break;
        a[i] = a[child]!;
        i = child;
      }
      a[i] = last;
    }
    return top;
  }
}
