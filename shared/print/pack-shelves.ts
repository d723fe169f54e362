/** A box to place: its size, in the order the caller lists them. */
export interface PackItem {
  width: number;
  height: number;
}

/** Where an item went: which bin (0-based) and its top-left corner inside that bin. */
export interface PackedItem {
  bin: number;
  x: number;
  y: number;
}

interface Shelf {
  y: number;
  height: number;
  /** Width used so far, from the bin's left edge. */
  used: number;
}

/** Room for float error when comparing lengths. */
const EPS_MM = 1e-9;

/**
 * First-fit decreasing height shelf packing over as many bins as it takes: items, tallest first
 * (the caller's order breaks ties), go on the first shelf of the first bin with room; a bin
 * opens a new shelf under its last one when none has room. Neighbours, and shelves, keep
 * gapMm apart; the first item and shelf sit at the bin's edge. Every item must fit an empty
 * bin. Returns positions in the caller's order and the number of bins used.
 */
export function packShelves(items: readonly PackItem[], binWidth: number, binHeight: number, gapMm: number): { packed: PackedItem[]; binCount: number } {
  const order = items.map((_, i) => i).sort((a, b) => items[b]!.height - items[a]!.height || a - b);
  const bins: Shelf[][] = [];
  const packed: PackedItem[] = new Array<PackedItem>(items.length);

  for (const index of order) {
    const item = items[index]!;
    if (item.width > binWidth + EPS_MM || item.height > binHeight + EPS_MM) {
      throw new RangeError(`A ${item.width} x ${item.height} mm item cannot fit a ${binWidth} x ${binHeight} mm bin.`);
    }
    packed[index] = placeItem(item, bins, binWidth, binHeight, gapMm);
  }
  return { packed, binCount: bins.length };
}

function placeItem(item: PackItem, bins: Shelf[][], binWidth: number, binHeight: number, gapMm: number): PackedItem {
  for (const [bin, shelves] of bins.entries()) {
    for (const shelf of shelves) {
      const x = shelf.used === 0 ? 0 : shelf.used + gapMm;
      if (item.height <= shelf.height + EPS_MM && x + item.width <= binWidth + EPS_MM) {
        shelf.used = x + item.width;
        return { bin, x, y: shelf.y };
      }
    }
    const last = shelves[shelves.length - 1];
    const y = last ? last.y + last.height + gapMm : 0;
    if (y + item.height <= binHeight + EPS_MM) {
      shelves.push({ y, height: item.height, used: item.width });
      return { bin, x: 0, y };
    }
  }
  bins.push([{ y: 0, height: item.height, used: item.width }]);
  return { bin: bins.length - 1, x: 0, y: 0 };
}
