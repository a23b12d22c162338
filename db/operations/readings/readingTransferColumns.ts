/**
 * CSV columns of a reading file, in the order an export writes them. Site and raw-input columns
 * are what an import reads; the others are written by an export so a re-import of it works.
 */
export const SITE_COLUMNS = ['model_code', 'site_label', 'site_id'] as const;

export const READING_COLUMNS = [
  'stage',
  'load_n',
  'observed_at',
  'operator',
  'wavelength_nm',
  'method',
  'whole_order',
  'lower_order',
  'analyzer_rotation_deg',
  'moved_fringe',
  'srgb_hex',
  'named_colour',
  'illuminant',
  'retardation_nm',
  'fringe_order',
  'sign',
  'uncertainty_fringes',
  'notes',
] as const;

/** Written by an export. An import uses id, supersedes_id and amendment_reason to rebuild amendments within the file, and ignores the rest. */
export const OUTPUT_ONLY_COLUMNS = ['id', 'fringe_order_uncertainty', 'supersedes_id', 'amendment_reason', 'recorded_at'] as const;

export const REQUIRED_COLUMNS = ['stage', 'observed_at', 'operator', 'wavelength_nm', 'method'] as const;

export const NUMERIC_COLUMNS = ['load_n', 'wavelength_nm', 'whole_order', 'lower_order', 'analyzer_rotation_deg', 'retardation_nm', 'fringe_order', 'uncertainty_fringes'] as const;

export const EXPORT_COLUMNS = ['id', 'model_code', 'site_label', ...READING_COLUMNS, 'fringe_order_uncertainty', 'supersedes_id', 'amendment_reason', 'recorded_at'] as const;

export const KNOWN_COLUMNS: ReadonlySet<string> = new Set([...SITE_COLUMNS, ...READING_COLUMNS, ...OUTPUT_ONLY_COLUMNS]);
