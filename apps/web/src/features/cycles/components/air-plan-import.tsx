import type { AirPlanRow, CycleView } from '@catline/contracts';
import { CsvImport } from '../../../components/csv-import.js';
import type { Column } from '../../../components/data-table.js';
import { formatWhole } from '../../../lib/format.js';
import { useConfirmAirPlan } from '../api/confirm-air-plan.js';
import { useAirPlanTemplate } from '../api/get-air-plan-template.js';
import { usePreviewAirPlan } from '../api/preview-air-plan.js';

const roles = (row: AirPlanRow) =>
  [row.tanker && 'Tanker', row.earlyWarning && 'Early warning', row.spare && 'Spare'].filter(Boolean).join(', ') || '—';

const columns: Column<AirPlanRow>[] = [
  { key: 'side', header: 'Side', cell: (row) => row.sideNumber },
  { key: 'type', header: 'Type', cell: (row) => row.typeDesignation ?? '—' },
  { key: 'squadron', header: 'Squadron', cell: (row) => row.squadronCode ?? '—' },
  { key: 'pilot', header: 'Pilot', cell: (row) => row.pilotName ?? row.pilotEmail ?? 'None yet' },
  { key: 'mission', header: 'Mission', cell: (row) => row.mission },
  { key: 'fuel', header: 'Fuel (lb)', cell: (row) => formatWhole(row.fuelLb), numeric: true },
  { key: 'gross', header: 'Gross weight (lb)', cell: (row) => formatWhole(row.grossWeightLb), numeric: true },
  { key: 'stores', header: 'Stores', cell: (row) => row.stores || '—' },
  { key: 'roles', header: 'Role', cell: roles },
];

/** Air operations brings the cycle's aircraft in from an air plan file instead of one by one. */
export function AirPlanImport({ cycle }: { cycle: CycleView }) {
  return (
    <CsvImport
      subject="air plan"
      hint="One line per aircraft: side number, pilot e-mail, mission, fuel, stores, gross weight and the tanker, early warning and spare marks. The template has the columns."
      template={useAirPlanTemplate()}
      preview={usePreviewAirPlan(cycle.id)}
      confirm={useConfirmAirPlan(cycle.id, cycle.version)}
      columns={columns}
      importLabel={(count) => `Import ${count} aircraft into cycle ${cycle.number}`}
      importedMessage={`Imported: the aircraft are in the deck pool of cycle ${cycle.number}.`}
    />
  );
}
