/**
 * The thread changes between placements, stitched one after another in the order given: for each placement, 1 when
 * the placement before it ended in another thread than this one starts with, else 0 (the first placement starts on
 * the thread the machine is set up with, which is no change). A placement whose threads are not known yet (a
 * picture still to be digitized) is `undefined`: nothing is counted into it or out of it until the studio counts it.
 */
export function colourChangesBetween(threadsInOrder: readonly (readonly string[] | undefined)[]): number[] {
  return threadsInOrder.map((threads, index) => {
    const before = index === 0 ? undefined : threadsInOrder[index - 1];
    if (!threads?.length || !before?.length) return 0;
    return before[before.length - 1] === threads[0] ? 0 : 1;
  });
}
