import fc from 'fast-check';

// The seed jest.config.js drew (or FC_SEED) for every property of the run.
fc.configureGlobal({ ...fc.readConfigureGlobal(), seed: Number(process.env.FC_SEED) });
