// Lints inline fixtures with the ESLint Node API and the repository's eslint.config.mjs.
// Reads [{ file, code }] as JSON on stdin, prints the rule ids of each result as JSON.
// (Run as its own process: Jest's module sandbox cannot load the ES-module config file.)
import { ESLint } from 'eslint';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const eslint = new ESLint({ cwd: root });
let input = '';
for await (const chunk of process.stdin) input += chunk;
const fixtures = JSON.parse(input);
const out = [];
for (const { file, code } of fixtures) {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, file) });
  out.push(result.messages.map((m) => m.ruleId ?? `fatal: ${m.message}`));
}
process.stdout.write(JSON.stringify(out));
