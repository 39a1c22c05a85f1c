export { assignLabels, runLetterFor } from './assign';
export { planLabels, segmentLabelOf, nodeLabelOf, type PlanLabels } from './names';
export { renumberRun } from './renumber';
