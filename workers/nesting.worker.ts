/// <reference lib="webworker" />
// Thin on purpose: the nesting logic and its boundary checks live in lib/nesting (tested in Node).
import * as Comlink from 'comlink';
import { createNestingWorkerApi } from '@/lib/nesting/worker-handler';

Comlink.expose(createNestingWorkerApi());
