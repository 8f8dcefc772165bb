#!/usr/bin/env node
import '../dist/lib/entry.js';
