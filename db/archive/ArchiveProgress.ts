/** What the export and import report while they run; scripts print it, the API ignores it. */
export interface ArchiveProgressEvent {
  phase: 'export' | 'verify' | 'restore';
  part: string;
  partRows: number;
  partTotal: number;
  doneRows: number;
  totalRows: number;
}

export type ArchiveProgress = (event: ArchiveProgressEvent) => void;
