import type { AircraftTypeView, LaunchTableImportRow } from '@catline/contracts';
import { CsvImport } from '../../../components/csv-import.js';
import type { Column } from '../../../components/data-table.js';
import { formatWhole } from '../../../lib/format.js';
import { useConfirmLaunchTable } from '../api/confirm-launch-table.js';
import { useLaunchTableTemplate } from '../api/get-launch-table-template.js';
import { usePreviewLaunchTable } from '../api/preview-launch-table.js';

const columns: Column<LaunchTableImportRow>[] = [
  { key: 'gross', header: 'Gross weight (lb)', cell: (row) => formatWhole(row.grossWeightLb), numeric: true },
  { key: 'airspeed', header: 'Min. launch airspeed (kt)', cell: (row) => row.minLaunchAirspeedKt, numeric: true },
];

/** The admin replaces a type's launch table from the ship's approved figures in a CSV file. */
export function LaunchTableImport({ type }: { type: AircraftTypeView }) {
  return (
    <CsvImport
      subject="launch table"
      hint="One line per gross weight, lightest first, with the minimum launch airspeed at that weight; at least two lines. Importing replaces the whole table."
      template={useLaunchTableTemplate()}
      preview={usePreviewLaunchTable(type.id)}
      confirm={useConfirmLaunchTable(type.id)}
      columns={columns}
      importLabel={(count) => `Replace the ${type.designation} table with these ${count} rows`}
      importedMessage={`Imported: the ${type.designation} launch table is replaced.`}
    />
  );
}
