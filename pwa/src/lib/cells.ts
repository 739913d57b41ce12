// The quota cell as the server reports it (GET cells, the quota board and every sync
// reply), shared by the interviewer's device cache and the office screens.

export type CellStatus = 'open' | 'nearly_full' | 'full' | 'closed';

export interface QuotaVariable {
  id: string;
  name: string;
  interlocked: boolean;
  categories: { id: string; label: string }[];
}

export interface QuotaCell {
  id: string;
  kind: 'interlocked' | 'margin';
  label: string;
  categoryIds: string[];
  target: number;
  achieved: number;
  overQuota: number;
  remaining: number;
  fillRate: number;
  status: CellStatus;
  closedAt: string | null;
}
