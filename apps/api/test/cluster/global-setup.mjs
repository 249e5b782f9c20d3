// Loads the workspace's .env before the spec's environment is made: a spec only sees a copy of
// process.env, so .env loaded from inside it would not reach it.
import { environmentFromProcess } from '../../dist/database/data-source.js';

export default function globalSetup() {
  environmentFromProcess();
}
