// The project's cells now live in lib (the assignment forms of two features read them too).
export { cellKeys, cellsQueryOptions, getCells, useCells, type ProjectCell, type ProjectCells } from '../../../lib/projects/get-cells';
