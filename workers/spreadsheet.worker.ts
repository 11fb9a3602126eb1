/// <reference lib="webworker" />
// Thin on purpose: reading and its limits live in lib/cut-list (tested in Node). A workbook that unpacks to far
// too much, or a slow parse, ties up this worker, never the page.
import * as Comlink from 'comlink';
import { readCutListFile } from '@/lib/cut-list/read-cut-list-file';

Comlink.expose({ readCutListFile });
