// The one error type of the plan model: a plain-language message and where it applies.

export interface PlanLocation {
  runId?: string;
  nodeId?: string;
  segmentId?: string;
  roomId?: string;
}

export class PlanError extends Error {
  readonly where: PlanLocation;

  constructor(message: string, where: PlanLocation = {}) {
    super(message);
    this.name = 'PlanError';
    this.where = where;
  }
}
