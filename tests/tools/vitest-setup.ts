// Property tests run from one fixed seed so a run is reproducible; set FC_SEED to explore other seeds.
// fast-check prints the seed and the counterexample on failure.
import fc from 'fast-check';

fc.configureGlobal({ seed: Number(process.env.FC_SEED ?? 20261201) });
