/** `npm run bench`: every figure beside a baseline measured in the same run. */
import { benchEngine } from './engine.bench';
import { printTable } from './measure';

printTable([...benchEngine()]);
