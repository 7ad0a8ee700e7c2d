/** The device API's address and example calls, for the credentials screen's how-to. */
export function deviceApiBase(origin: string): string {
  return `${origin.replace(/\/$/, '')}/api/device/v1`;
}

/** A device's three calls as curl commands; the token is always the placeholder, never the real one. */
export function curlExamples(origin: string): { title: string; command: string }[] {
  const base = deviceApiBase(origin);
  const auth = `-H "Authorization: Bearer $FAINTLINE_TOKEN"`;
  return [
    {
      title:
        'Fetch the configuration and plan (about 2 KB gzip-compressed, about ten times that plain; send If-None-Match with the last ETag to get a short 304)',
      command: `curl -i --compressed ${auth} \\\n  ${base}/config`,
    },
    {
      title: 'Report a heartbeat (about once a minute)',
      command: `curl -X POST ${auth} \\\n  -H 'Content-Type: application/json' \\\n  -d '{"uptimeS":3600,"firmwareVersion":"1.0.0","timeSource":"network","clockOffsetMs":12,"temperatureC":21.5,"supplyV":5.0}' \\\n  ${base}/heartbeat`,
    },
    {
      title: 'Log what was sent',
      command: `curl -X POST ${auth} \\\n  -H 'Content-Type: application/json' \\\n  -d '{"transmissions":[{"startUtc":"2026-12-02T10:00:01Z","bandId":"20m","frequencyHz":14097100,"messageText":"Q1ABC IO91 23"}]}' \\\n  ${base}/transmissions`,
    },
  ];
}
