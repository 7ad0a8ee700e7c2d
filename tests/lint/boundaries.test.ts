/**
 * The house rules in eslint.config.mjs, shown to bite: each boundary rule fails on a deliberate
 * violation (an inline fixture linted as if it lived at the given path) and a clean file passes.
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';

/** Lints every fixture in one run of lint-texts.mjs (ESLint's Node API: new ESLint({ cwd }).lintText). */
function lintAll(fixtures: { file: string; code: string }[]): string[][] {
  const output = execFileSync(process.execPath, [path.join(__dirname, 'lint-texts.mjs')], {
    input: JSON.stringify(fixtures),
    encoding: 'utf8',
    timeout: 120_000,
  });
  return JSON.parse(output);
}

const violations: { rule: string; file: string; code: string; expected: string }[] = [
  {
    rule: 'shared/ imports no React',
    file: 'shared/domain/x.ts',
    code: "import React from 'react';\nexport const x = React;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'shared/ imports no Express',
    file: 'shared/domain/x.ts',
    code: "import express from 'express';\nexport const x = express;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'shared/ imports no node:fs',
    file: 'shared/domain/x.ts',
    code: "import { readFileSync } from 'node:fs';\nexport const x = readFileSync;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'shared/ reads no clock (Date.now)',
    file: 'shared/domain/x.ts',
    code: 'export const x = () => Date.now();\n',
    expected: 'no-restricted-syntax',
  },
  {
    rule: 'shared/ reads no clock (new Date())',
    file: 'shared/domain/x.ts',
    code: 'export const x = () => new Date();\n',
    expected: 'no-restricted-syntax',
  },
  {
    rule: 'only components/ui renders Text',
    file: 'components/stations/x.tsx',
    code: "import { Text } from 'react-native';\nexport const X = Text;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'routes import no server code',
    file: 'app/x.tsx',
    code: "import { createApp } from '@/server/app';\nexport const x = createApp;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'components import no routes',
    file: 'components/stations/x.tsx',
    code: "import Screen from '@/app/(tabs)/stations/index';\nexport const x = Screen;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'services import no models',
    file: 'server/features/stations/x.service.ts',
    code: "import { StationModel } from '../../db/models/station.model';\nexport const x = StationModel;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'routers import no models',
    file: 'server/features/stations/x.router.ts',
    code: "import { StationModel } from '@/server/db/models/station.model';\nexport const x = StationModel;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: "a feature imports no other feature's repo",
    file: 'server/features/clubs/x.service.ts',
    code: "import { findById } from '../stations/stations.repo';\nexport const x = findById;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: "a feature's helper imports no other feature's repo either",
    file: 'server/features/devices/x.ts',
    code: "import { findById } from '../units/units.repo';\nexport const x = findById;\n",
    expected: 'no-restricted-imports',
  },
  {
    rule: 'no fetch outside the typed client',
    file: 'components/stations/x.ts',
    code: "export const x = () => fetch('/api/stations');\n",
    expected: 'no-restricted-globals',
  },
  {
    rule: 'no fetch in the server outside the simulator transport',
    file: 'server/simulator/device-sim.ts',
    code: "export const x = () => fetch('http://127.0.0.1/');\n",
    expected: 'no-restricted-globals',
  },
];

const clean: { what: string; file: string; code: string }[] = [
  {
    what: 'pure shared code taking the time as a parameter',
    file: 'shared/domain/x.ts',
    code: 'export const later = (nowMs: number) => new Date(nowMs + 1000);\n',
  },
  {
    what: 'a component using the ui kit',
    file: 'components/stations/x.tsx',
    code: "import { View } from 'react-native';\nexport const X = View;\n",
  },
  {
    what: 'the ui kit rendering Text',
    file: 'components/ui/x.tsx',
    code: "import { Text } from 'react-native';\nexport const X = Text;\n",
  },
  {
    what: 'a repo importing its model',
    file: 'server/features/stations/x.repo.ts',
    code: "import { StationModel } from '../../db/models/station.model';\nexport const x = StationModel;\n",
  },
  {
    what: "a service using another feature's service",
    file: 'server/features/clubs/x.service.ts',
    code: "import { stationById } from '../stations/stations.service';\nexport const x = stationById;\n",
  },
  {
    what: 'a service using its own repo',
    file: 'server/features/clubs/x.service.ts',
    code: "import { findClub } from './clubs.repo';\nexport const x = findClub;\n",
  },
  { what: 'fetch in the typed client', file: 'shared/api/client.ts', code: "export const x = () => fetch('/api/health');\n" },
  {
    what: 'fetch in the simulator transport',
    file: 'server/simulator/transport.ts',
    code: "export const x = () => fetch('http://127.0.0.1/');\n",
  },
];

describe('the boundary rules', () => {
  let found: string[][] = [];
  beforeAll(() => {
    found = lintAll([...violations, ...clean]);
  }, 120_000);

  it.each(violations.map((v, i) => ({ ...v, i })))('fail: $rule ($file)', ({ i, expected }) => {
    expect(found[i]).toContain(expected);
  });

  it.each(clean.map((c, i) => ({ ...c, i: violations.length + i })))('pass: $what ($file)', ({ i }) => {
    expect(found[i]).toEqual([]);
  });
});
