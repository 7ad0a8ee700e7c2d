#!/usr/bin/env node
// Launcher for the faintline command: loads the TypeScript entry through tsx, no build step.
'use strict';
require('tsx/cjs');
require('./faintline.ts');
