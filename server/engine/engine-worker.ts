/** The engine pool's worker: piscina calls the default export with each task. */
import { runEngineTask } from './engine-task';

export default runEngineTask;
