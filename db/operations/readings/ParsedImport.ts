import type { FieldProblem } from '../../../src/errors/DomainError.ts';

export type SiteReference = { siteId: string } | { modelCode: string; siteLabel: string };

/** One row of an import file, read but not yet validated. */
export interface ImportCandidate {
  /** As the user counts: CSV rows from 1 with the header as row 1; JSON readings from 1. */
  row: number;
  /** Undefined when the row names no usable site (a problem was recorded). */
  site: SiteReference | undefined;
  /** What CreateReadingInput will judge. */
  reading: unknown;
  /** Derived values a previous export wrote; they must agree with what the raw inputs give. */
  echo: { fringeOrder?: number; retardationNm?: number };
  /** The row's id in the file (an export writes the stored id), when given. */
  fileId?: string;
  /** What an export wrote of an amendment: the id of the reading it supersedes, and why. */
  amends?: { fileId: string; reason: string | undefined };
}

export interface ParsedImport {
  format: 'csv' | 'json';
  candidates: ImportCandidate[];
  problems: FieldProblem[];
  /** Names a field of CreateReadingInput (a zod issue path) the way this file names it. */
  fieldOf(path: readonly PropertyKey[]): string;
}
