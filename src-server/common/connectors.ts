/** RF connectors as the trade writes them; one vocabulary for parts and radios alike. */
export const CONNECTORS = ['solder-pad', 'SMA', 'RP-SMA', 'MMCX', 'MCX', 'N', 'micro-coax'] as const;
export type Connector = (typeof CONNECTORS)[number];
