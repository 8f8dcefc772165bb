/** Types for screen-model.mjs (a small terminal model for the tests and the bench). */
export declare function applySgr(style: string, params: string): string;
export declare class VirtualTerminal {
  constructor(columns?: number, rows?: number);
  columns: number;
  rows: number;
  row: number;
  col: number;
  pen: string;
  grid: string[][];
  styles: string[][];
  write(data: string): void;
  text(): string;
  styledRows(): [string, string][][];
  snapshot(): string[][];
}
export declare function changedCharacterBytes(before: readonly (readonly string[])[], after: readonly (readonly string[])[]): number;
