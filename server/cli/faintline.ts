/** Entry point of the `faintline` command (bin/faintline.js loads it through tsx). */
import { runCli } from './program';

void runCli(process.argv);
