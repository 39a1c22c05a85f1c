// The entry of each worker thread in the compute pool (bundled by scripts/build-worker.ts).
import { runComputeTask, type ComputeTask, type TaskOutcome } from './tasks';

export default function work(task: ComputeTask): TaskOutcome {
  return runComputeTask(task);
}
