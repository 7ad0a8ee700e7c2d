/** How a receiver posts what it decoded: the address and a curl example with placeholder values. */
export function receptionsEndpoint(origin: string): string {
  return `${origin.replace(/\/$/, '')}/api/device/v1/receptions`;
}

/** The token is always the shell variable, never the real one, so the example can be shared. */
export function receptionsCurlExample(origin: string): string {
  const body = JSON.stringify({
    reports: [
      {
        slotUtc: '2026-12-02T10:04:00Z',
        bandId: '20m',
        txCallsign: 'Q1ABC',
        txLocator: 'IO91',
        txPowerDbm: 23,
        snrDb: -17,
        frequencyHz: 14097052,
        driftHz: 0,
      },
    ],
  });
  return `curl -X POST -H "Authorization: Bearer $FAINTLINE_TOKEN" \\\n  -H 'Content-Type: application/json' \\\n  -d '${body}' \\\n  ${receptionsEndpoint(origin)}`;
}
