/**
 * The lab archive's own format (described for people in DEVELOPERS.md, "Lab archive format"):
 * one gzip stream of UTF-8 lines. Control lines start with "@"; every other line is one row as
 * a JSON object. Bump the version when a reader of the old version would misread the new one.
 */
export const ARCHIVE_FORMAT = 'fringe-ledger-lab-archive';
export const ARCHIVE_FORMAT_VERSION = 1;

/** Rows per keyset page on export and per bulk statement on import. */
export const ARCHIVE_PAGE_ROWS = 5000;

/** A line longer than this is not one of ours; refusing it keeps junk from filling memory. */
export const ARCHIVE_MAX_LINE_CHARS = 16 * 1024 * 1024;

export interface ArchiveSchemaVersion {
  /** Tag of the newest applied drizzle migration, e.g. "0006_annealing_records_are_immutable". */
  migration: string;
  /** drizzle's SHA-256 of that migration's SQL, as stored in drizzle.__drizzle_migrations. */
  hash: string;
  /** The migration's journal time (ms), which orders migrations. */
  migratedAt: number;
  migrationCount: number;
}

export interface ArchivePartPlan {
  /** The table name, or "<table>.shared" for shared rows the lab's records point at. */
  name: string;
  table: string;
  scope: 'lab' | 'shared';
  /** Columns of each row object; lab_id is left out, it is the archive's lab. */
  columns: string[];
  rows: number;
}

export interface ArchiveOpening {
  format: typeof ARCHIVE_FORMAT;
  formatVersion: number;
  createdAt: string;
  schema: ArchiveSchemaVersion;
  lab: { id: string; name: string; createdAt: string };
  parts: ArchivePartPlan[];
  /** Versions of shared catalogue rows the lab's records point at, per table. */
  catalogueVersions: Record<string, string[]>;
}

export interface ArchivePartEnd {
  name: string;
  rows: number;
  sha256: string;
}

/** The closing line: the opening again with every part's count and digest. */
export interface ArchiveManifest extends Omit<ArchiveOpening, 'parts'> {
  parts: (ArchivePartPlan & { sha256: string })[];
}
