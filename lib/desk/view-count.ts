/**
 * Views count their tickets up to this many; past it the Desk shows "999+". Every agent's Desk counts every view
 * on each load and refresh, and an exact count of 100,000 open tickets costs more than the exact number is worth.
 */
export const VIEW_COUNT_CAP = 999;

export const viewCountLabel = (count: number) => (count > VIEW_COUNT_CAP ? `${VIEW_COUNT_CAP}+` : String(count));
