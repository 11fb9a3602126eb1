/**
 * Limits on an uploaded cut list. A shop's cut list is tens to a few hundred rows; these leave room for a
 * whole house of cabinets while keeping one request small enough to validate and write in one transaction.
 */
export const UPLOAD_LIMITS = {
  /** Bytes of the file as chosen (CSV or XLSX). */
  maxFileBytes: 512 * 1024,
  /** Data rows, header excluded. */
  maxRows: 1000,
  maxColumns: 30,
  /** Characters in one cell; a longer cell is refused on its row (the rest of the file still reads). */
  maxCellLength: 200,
} as const;

export const UPLOAD_EXTENSIONS = ['.csv', '.txt', '.xlsx'] as const;
