/** Entry point of the `faintline` command (server/cli/bin.js loads it through tsx). */
import { runCli } from './program';

void runCli(process.argv);
