// The quota cell as the server reports it (GET cells, the quota board and every sync
// reply), shared by the interviewer's device cache and the office screens. The shapes are
// generated from the API's OpenAPI document (lib/api-types.ts).
import type { CellResponse, CellStatus, QuotaVariableResponse } from './api-types';

export type { CellStatus };
export type QuotaVariable = QuotaVariableResponse;
export type QuotaCell = CellResponse;
