// Drawing units of a DXF file: the header variable $INSUNITS ("default drawing units for AutoCAD
// DesignCenter blocks"), as its code table in the AutoCAD DXF Reference, HEADER section, lists them.
// 0 is "unitless": such a drawing's scale is set on the plan by two points, as for an image.

export interface DxfUnits { code: number; name: string; metresPerUnit: number }

// Source: AutoCAD DXF Reference (Autodesk), HEADER Section Group Codes, $INSUNITS:
// 1 inches, 2 feet, 3 miles, 4 millimetres, 5 centimetres, 6 metres, 7 kilometres, 8 microinches,
// 9 mils, 10 yards, 11 ångströms, 12 nanometres, 13 microns, 14 decimetres, 15 decametres,
// 16 hectometres, 17 gigametres, 18 astronomical units, 19 light years, 20 parsecs,
// 21 US survey feet, 22 US survey inches, 23 US survey yards, 24 US survey miles.
// The lengths in metres: 1 in = 0.0254 m and 1 yd = 0.9144 m exactly (international yard and pound, 1959);
// 1 US survey foot = 1200/3937 m (US Metric Law of 1866, as the survey foot).
const US_SURVEY_FOOT_M = 1200 / 3937;
const UNITS: Record<number, Omit<DxfUnits, 'code'>> = {
  1: { name: 'inches', metresPerUnit: 0.0254 },
  2: { name: 'feet', metresPerUnit: 0.3048 },
  3: { name: 'miles', metresPerUnit: 1609.344 },
  4: { name: 'millimetres', metresPerUnit: 0.001 },
  5: { name: 'centimetres', metresPerUnit: 0.01 },
  6: { name: 'metres', metresPerUnit: 1 },
  7: { name: 'kilometres', metresPerUnit: 1000 },
  8: { name: 'microinches', metresPerUnit: 0.0254e-6 },
  9: { name: 'mils', metresPerUnit: 0.0254e-3 },
  10: { name: 'yards', metresPerUnit: 0.9144 },
  11: { name: 'ångströms', metresPerUnit: 1e-10 },
  12: { name: 'nanometres', metresPerUnit: 1e-9 },
  13: { name: 'microns', metresPerUnit: 1e-6 },
  14: { name: 'decimetres', metresPerUnit: 0.1 },
  15: { name: 'decametres', metresPerUnit: 10 },
  16: { name: 'hectometres', metresPerUnit: 100 },
  21: { name: 'US survey feet', metresPerUnit: US_SURVEY_FOOT_M },
  22: { name: 'US survey inches', metresPerUnit: US_SURVEY_FOOT_M / 12 },
  23: { name: 'US survey yards', metresPerUnit: US_SURVEY_FOOT_M * 3 },
  24: { name: 'US survey miles', metresPerUnit: US_SURVEY_FOOT_M * 5280 },
};

/** The units a $INSUNITS code states, or null for 0 (unitless), a missing header and the astronomical codes 17–20 no building plan uses. */
export function dxfUnits(code: unknown): DxfUnits | null {
  if (typeof code !== 'number' || !Number.isInteger(code)) return null;
  const units = UNITS[code];
  return units ? { code, ...units } : null;
}
