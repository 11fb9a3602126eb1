/// <reference lib="webworker" />
// Thin on purpose: the layout bench's live check (validatePlan and rebuildCuts) lives in lib/layout-bench, tested in Node.
import * as Comlink from 'comlink';
import { checkRevision } from '@/lib/layout-bench/live-check';

Comlink.expose({ check: checkRevision });
