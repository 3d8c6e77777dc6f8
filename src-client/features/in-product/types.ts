import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];

export type { AntennaRole } from '../../lib/antenna-role-labels';

export type InProductMeasurement = Schemas['InProductMeasurementDto'];

export type PortAssignment = Schemas['PortAssignmentDto'];

export type ProductIsolation = Schemas['ProductIsolationDto'];

export type IsolationAntenna = Schemas['IsolationAntennaDto'];

export type IsolationCell = Schemas['IsolationCellDto'];

export type CorrelationRow = Schemas['CorrelationRowDto'];

/** Of the product's radios, what the port mapping offers: each radio with the antennas it needs. */
export type RadioChoice = Pick<Schemas['RadioDto'], 'id' | 'name' | 'antennaRoles'>;
