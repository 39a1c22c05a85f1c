// Why a file was refused as a plan drawing in DXF, with the message a person reads.

export type DxfRefusal = 'dwg' | 'binary_dxf' | 'not_dxf' | 'damaged' | 'too_many_entities' | 'too_many_points' | 'nothing_drawable';

export class DxfError extends Error {
  readonly reason: DxfRefusal;

  constructor(reason: DxfRefusal, message: string) {
    super(message);
    this.name = 'DxfError';
    this.reason = reason;
  }
}
