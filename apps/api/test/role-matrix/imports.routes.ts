import type { AircraftTypeView, CycleView } from '@catline/contracts';
import { multipartCsv, uploadCsv } from '../support/csv-upload.js';
import { createAircraftType } from '../support/fleet-fixtures.js';
import { LineupDriver } from '../support/lineup-fixtures.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

const AIR_PLAN =
  'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare\nC21,,Strike training,11500,,45000,no,no,no\n';
const LAUNCH_TABLE = 'gross_weight_lb,min_launch_airspeed_kt\n25000,115\n40000,135\n';

// A preview changes no cycle, so every caller previews into one; a permitted confirm gets a fresh cycle.
let sharedCycle: Promise<CycleView> | undefined;
const cycleFor = (context: MatrixContext) => {
  const driver = new LineupDriver(context.baseUrl);
  if (context.allowed) return driver.createCycle();
  sharedCycle ??= driver.createCycle();
  return sharedCycle;
};

// Likewise one aircraft type for every launch table preview and refused confirm.
let sharedType: Promise<AircraftTypeView> | undefined;
const typeFor = (context: MatrixContext) => {
  if (context.allowed) return createAircraftType(context.baseUrl, context.tokenOf('admin'));
  sharedType ??= createAircraftType(context.baseUrl, context.tokenOf('admin'));
  return sharedType;
};

async function previewed(
  context: MatrixContext,
  path: string,
  role: 'air_operations' | 'admin',
  content: string,
): Promise<number> {
  const response = await uploadCsv(context.baseUrl, context.tokenOf(role), path, { content });
  if (response.status !== 200 || response.body.result !== 'accepted')
    throw new Error(`Preview of ${path} failed: ${JSON.stringify(response.body)}`);
  return response.body.uploadId as number;
}

export const importsRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/air-plan/template', allowed: ['air_operations'] },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/air-plan/imports',
    allowed: ['air_operations'],
    example: async (context) => ({ params: { cycleId: (await cycleFor({ ...context, allowed: false })).id } }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/air-plan/preview',
    allowed: ['air_operations'],
    example: async (context) => ({
      params: { cycleId: (await cycleFor({ ...context, allowed: false })).id },
      ...multipartCsv(AIR_PLAN),
    }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/air-plan/imports/{uploadId}/confirm',
    allowed: ['air_operations'],
    example: async (context) => {
      const cycle = await cycleFor(context);
      const uploadId = context.allowed
        ? await previewed(context, `/api/cycles/${cycle.id}/air-plan/preview`, 'air_operations', AIR_PLAN)
        : 1;
      return { params: { cycleId: cycle.id, uploadId }, body: { basisVersion: cycle.version } };
    },
  },
  { method: 'GET', path: '/api/aircraft-types/launch-table/template', allowed: ['admin'] },
  {
    method: 'GET',
    path: '/api/aircraft-types/{id}/launch-table/imports',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: (await typeFor({ ...context, allowed: false })).id } }),
  },
  {
    method: 'POST',
    path: '/api/aircraft-types/{id}/launch-table/preview',
    allowed: ['admin'],
    example: async (context) => ({
      params: { id: (await typeFor({ ...context, allowed: false })).id },
      ...multipartCsv(LAUNCH_TABLE),
    }),
  },
  {
    method: 'POST',
    path: '/api/aircraft-types/{id}/launch-table/imports/{uploadId}/confirm',
    allowed: ['admin'],
    example: async (context) => {
      const type = await typeFor(context);
      const uploadId = context.allowed
        ? await previewed(context, `/api/aircraft-types/${type.id}/launch-table/preview`, 'admin', LAUNCH_TABLE)
        : 1;
      return { params: { id: type.id, uploadId } };
    },
  },
];
