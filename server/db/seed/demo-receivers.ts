/**
 * Fictional receivers for the demo: Q-prefixed callsigns (never issued to amateurs) at real locator squares on
 * several continents. The first ones are the simulator's listening posts (their tokens are demo credentials only).
 */
export type DemoReceiver = { callsign: string; locator: string; bands: string[] };

export const DEMO_RECEIVERS: DemoReceiver[] = [
  { callsign: 'Q4AVR', locator: 'IO91VL', bands: ['20m', '40m', '30m'] },
  { callsign: 'Q5BEX', locator: 'JO62QM', bands: ['40m', '80m', '20m'] },
  { callsign: 'Q6CLT', locator: 'JN48FW', bands: ['20m', '30m'] },
  { callsign: 'Q7DNA', locator: 'KP20LE', bands: ['40m', '20m'] },
  { callsign: 'Q8EKO', locator: 'IN80DK', bands: ['20m', '17m', '15m'] },
  { callsign: 'Q4FJR', locator: 'JO59JW', bands: ['80m', '40m'] },
  { callsign: 'Q5GMS', locator: 'FN31PR', bands: ['20m', '40m', '30m'] },
  { callsign: 'Q6HRT', locator: 'EM12KX', bands: ['20m', '15m', '10m'] },
  { callsign: 'Q7IWB', locator: 'DM79LQ', bands: ['20m', '30m'] },
  { callsign: 'Q8JXC', locator: 'CN87TO', bands: ['20m', '40m'] },
  { callsign: 'Q4KYD', locator: 'FN20XR', bands: ['40m', '20m', '80m'] },
  { callsign: 'Q5LZE', locator: 'EN52WB', bands: ['20m', '17m'] },
  { callsign: 'Q6MAF', locator: 'GG66RF', bands: ['20m', '15m'] },
  { callsign: 'Q7NBG', locator: 'FF46PN', bands: ['20m', '10m'] },
  { callsign: 'Q8OCH', locator: 'KG33WX', bands: ['20m', '30m', '40m'] },
  { callsign: 'Q4PDI', locator: 'IM58KR', bands: ['40m', '20m'] },
  { callsign: 'Q5QEJ', locator: 'KM72JB', bands: ['20m', '17m'] },
  { callsign: 'Q6RFK', locator: 'LL57SS', bands: ['20m', '15m'] },
  { callsign: 'Q7SGL', locator: 'PM95TQ', bands: ['20m', '30m', '40m'] },
  { callsign: 'Q8THM', locator: 'OL72CQ', bands: ['20m', '17m'] },
  { callsign: 'Q4UIN', locator: 'MK82SX', bands: ['20m', '40m'] },
  { callsign: 'Q5VJO', locator: 'QF56NE', bands: ['20m', '30m', '40m'] },
  { callsign: 'Q6WKP', locator: 'RF80LQ', bands: ['20m', '15m'] },
  { callsign: 'Q7XLQ', locator: 'PF95IB', bands: ['20m', '40m'] },
  { callsign: 'Q8YMR', locator: 'BL11BH', bands: ['20m', '30m'] },
  { callsign: 'Q4ZNS', locator: 'KO85UR', bands: ['40m', '20m', '30m'] },
  { callsign: 'Q5AOT', locator: 'JN58TD', bands: ['80m', '40m', '30m', '20m'] },
  { callsign: 'Q6BPU', locator: 'IO83QK', bands: ['40m', '80m'] },
  { callsign: 'Q7CQV', locator: 'JP50DH', bands: ['20m', '40m'] },
  { callsign: 'Q8DRW', locator: 'HK36MQ', bands: ['20m', '15m'] },
  { callsign: 'Q4ESX', locator: 'JJ16QM', bands: ['20m'] },
  { callsign: 'Q5FTY', locator: 'QM05DQ', bands: ['20m', '40m'] },
];

/** Listening posts the simulator posts as (`npm run simulate -- --receivers N`): the first receivers above. */
export const DEMO_SIM_POSTS = DEMO_RECEIVERS.slice(0, 12).map((r, i) => ({
  ...r,
  name: `Simulated receiver ${i + 1} (${r.locator})`,
  token: `flp_demo_simulated_receiver_${String(i + 1).padStart(2, '0')}`,
}));
