// The OpenAPI texts of the import and export routes: the file layout is the contract a lab's
// spreadsheet has to meet, so it is spelled out where clients read it.

export const IMPORT_DESCRIPTION = `
Imports a whole file of fringe readings, or nothing: every row is validated with the same rules as
POST /v1/sites/{id}/readings and every site is resolved before anything is written. A refused file
answers 422 with \`errors[]\` of \`{ row, field, message }\` (at most 200 listed, then a count).

**CSV** (\`Content-Type: text/csv\`, UTF-8, comma-separated, header row of snake_case columns; the
header is row 1, the first reading row 2; column order is free):

| column | meaning |
|---|---|
| model_code, site_label | the site, by its model's code and its label (or give site_id instead) |
| site_id | the site's id, instead of model_code and site_label |
| stage | before_load, under_load, after_unload, before_anneal, after_anneal, inspection (required) |
| load_n | load in N, only and always for under_load |
| observed_at | ISO 8601 instant with offset, e.g. 2026-11-21T14:05:00Z (required) |
| operator | who read the fringes (required) |
| wavelength_nm | wavelength of the light in nm; an empty cell means white light (required column) |
| method | whole_order, tardy, senarmont, compensator, direct (required) |
| whole_order | whole_order and senarmont: the whole fringe order |
| lower_order, moved_fringe | tardy: the lower whole order and which fringe was moved (lower, upper) |
| analyzer_rotation_deg | tardy and senarmont: analyzer rotation in degrees, 0–180 |
| retardation_nm | compensator: the compensator's retardation in nm; other methods: optional derived value, checked |
| fringe_order | direct: the fringe order; other methods: optional derived value, checked |
| sign | positive, negative or unknown (default unknown) |
| uncertainty_fringes | standard uncertainty of the reading in fringes (default: the method's) |
| notes | free text |

Columns an export adds (id, fringe_order_uncertainty, supersedes_id, amendment_reason, recorded_at)
are accepted, so an export can be imported again; a re-imported reading is a new record with a new
id. A row whose supersedes_id is the id of another row of the same file (an export with
includeSuperseded=true) becomes the amendment of that row's new reading, with its
amendment_reason, so the superseded reading stays superseded; such a link must stay at one site,
carry a reason, and give each reading at most one successor. A supersedes_id naming no row of the
file is dropped (the row is imported as an original). Cells with text where a number belongs, unknown or repeated columns, a missing
required column, or a row with a different number of cells than the header are refused.

Example:

\`\`\`
model_code,site_label,stage,load_n,observed_at,operator,wavelength_nm,method,whole_order,lower_order,analyzer_rotation_deg,moved_fringe,sign
UN-07,upper notch root,before_load,,2026-11-21T14:05:00Z,R. Okafor,577,tardy,,0,27,lower,unknown
UN-07,upper notch root,under_load,450,2026-11-21T14:20:00Z,R. Okafor,577,whole_order,3,,,,positive
\`\`\`

**JSON** (\`Content-Type: application/json\`): \`{ "readings": [ ... ] }\`, each item a ReadingInput
plus modelCode and siteLabel (or siteId); rows are counted from 1 in array order. An export's id,
supersedesId and amendmentReason rebuild amendments as for CSV.

Any other content type answers 415. An optional \`Idempotency-Key\` header (up to 200 characters)
makes a retry safe: the same key with the same body answers the first import (200, replayed) and
writes nothing; the same key with another body answers 409. \`readingIds\` (in file order) are
listed for files of up to 1000 rows, on the first answer only.
`;

export const EXPORT_DESCRIPTION = `
Streams the lab's readings that match the filters, in the import's columns (CSV, the default) or
as \`{ "readings": [ ... ] }\` (JSON), so an export can be imported again, into this lab or another
with the same model codes and site labels. Beside the raw inputs each row carries id, the derived
fringe_order, fringe_order_uncertainty and retardation_nm, supersedes_id, amendment_reason and
recorded_at. Superseded readings are left out unless includeSuperseded=true; from is inclusive and
to exclusive on observed_at. Rows come in the order they were recorded.
`;
