/**
 * Device tokens for the demo stations, so `npm start` plus `npm run simulate` shows a live fleet.
 * They are demo credentials only: rotate them for anything real.
 */
export const DEMO_DEVICES = [
  { stationName: 'Clubhouse reference', token: 'fld_demo_clubhouse_reference_saltmarsh' },
  { stationName: 'Attic beacon', token: 'fld_demo_attic_beacon_saltmarsh' },
  { stationName: 'Shed rig', token: 'fld_demo_shed_rig_saltmarsh' },
];
