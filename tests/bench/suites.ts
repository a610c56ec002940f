// Every benchmark suite, in the order `npm run bench` runs them. Add one line per suite.
import type { BenchSuite } from './bench.ts';
import { formsBench } from './forms.bench.ts';
import { gcdBench, realRootsBench, rootsBench } from './roots.bench.ts';
import { nineBench } from './nine.bench.ts';
import { pointsBench } from './points.bench.ts';
import { curveBench } from './curve.bench.ts';
import { traceBench } from './trace.bench.ts';
import { scenesBench } from './scenes.bench.ts';
import { groupBench } from './group.bench.ts';
import { dragBench } from './drag.bench.ts';
import { followBench } from './follow.bench.ts';

export const SUITES: BenchSuite[] = [formsBench, rootsBench, gcdBench, realRootsBench, nineBench, pointsBench, curveBench, traceBench, scenesBench, groupBench, followBench, dragBench];
