export type CellStatus = 'open' | 'nearly_full' | 'full' | 'closed';

/** Share of the target that may remain for a cell to count as nearly full (common practice). */
export declare const NEARLY_FULL_SHARE: number;

/**
 * A cell's status: closed by a supervisor wins; full when nothing remains; nearly full when at
 * most a tenth of the target (at least one interview) remains; otherwise open.
 */
export declare function cellStatus(target: number, achieved: number, closed: boolean): CellStatus;
