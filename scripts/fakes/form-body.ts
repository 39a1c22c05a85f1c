// Reads the payment SDK's form bodies (`items[0][quantity]=2&metadata[teamId]=…`) into
// nested objects; numeric keys become arrays.
export type FormValue = string | FormValue[] | { [key: string]: FormValue };

function assign(target: Record<string, FormValue> | FormValue[], keys: string[], value: string): void {
  const [key, ...rest] = keys;
  const container = target as Record<string, FormValue>;
  if (rest.length === 0) { container[key] = value; return; }
  container[key] ??= /^\d+$/.test(rest[0]) ? [] : {};
  assign(container[key] as Record<string, FormValue>, rest, value);
}

export function parseFormBody(text: string): Record<string, FormValue> {
  const result: Record<string, FormValue> = {};
  for (const [name, value] of new URLSearchParams(text)) {
    const keys = name.replace(/\]/g, '').split('[');
    assign(result, keys, value);
  }
  return result;
}
