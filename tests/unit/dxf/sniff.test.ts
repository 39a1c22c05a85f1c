import { describe, expect, it } from 'vitest';
import { cadFileKind } from '@/lib/dxf/sniff';
import { dxfUnits } from '@/lib/dxf/units';
import { sampleFloorPlan } from '../../helpers/dxf-sample';

const bytes = (text: string) => new TextEncoder().encode(text);

describe('cadFileKind', () => {
  // DWG header: version string first, e.g. "AC1032" for AutoCAD 2018 (Open Design Specification for .dwg files, §2).
  it('knows a DWG by its version string', () => {
    expect(cadFileKind(new Uint8Array([...bytes('AC1032'), 0, 0, 0, 0, 0, 0x1f, 0x2b]))).toBe('dwg');
    expect(cadFileKind(bytes('AC1015\0\0\0\0'))).toBe('dwg');
  });

  // Binary DXF sentinel: "AutoCAD Binary DXF" CR LF SUB NUL (AutoCAD DXF Reference, Binary DXF Files).
  it('knows a binary DXF by its sentinel', () => {
    expect(cadFileKind(new Uint8Array([...bytes('AutoCAD Binary DXF\r\n'), 0x1a, 0]))).toBe('binary_dxf');
  });

  it('knows an ASCII DXF by its opening 0 / SECTION, after comments and with CR LF line ends', () => {
    expect(cadFileKind(bytes(sampleFloorPlan('mm')))).toBe('ascii_dxf');
    expect(cadFileKind(bytes('999\r\nwritten by a test\r\n  0\r\nSECTION\r\n  2\r\nHEADER\r\n'))).toBe('ascii_dxf');
  });

  it('takes nothing else for DXF', () => {
    expect(cadFileKind(bytes('room, width, depth\nRecital room, 12, 9\n'))).toBeNull();
    expect(cadFileKind(bytes('0\nNOT A SECTION\n'))).toBeNull();
    expect(cadFileKind(new Uint8Array([0x89, 0x50, 0x4e, 0x47]))).toBeNull();
  });
});

describe('dxfUnits ($INSUNITS, AutoCAD DXF Reference, HEADER section)', () => {
  it('reads the codes as the reference lists them', () => {
    expect(dxfUnits(4)).toMatchObject({ name: 'millimetres', metresPerUnit: 0.001 });
    expect(dxfUnits(6)).toMatchObject({ name: 'metres', metresPerUnit: 1 });
    expect(dxfUnits(1)).toMatchObject({ name: 'inches', metresPerUnit: 0.0254 });
    expect(dxfUnits(5)).toMatchObject({ name: 'centimetres', metresPerUnit: 0.01 });
    // US survey foot: 1200/3937 m (US Metric Law of 1866)
    expect(dxfUnits(21)!.metresPerUnit).toBeCloseTo(0.3048006096, 10);
  });

  it('has no units for 0 (unitless), a missing header or codes no plan uses', () => {
    expect(dxfUnits(0)).toBeNull();
    expect(dxfUnits(undefined)).toBeNull();
    expect(dxfUnits(18)).toBeNull();
  });
});
