import { ApiError } from "./api-error";

/** A decoded form or query value. The payments API encodes nested data as `a[b][0][c]=x`. */
export type FormValue = string | FormValue[] | FormFields;
export type FormFields = { [key: string]: FormValue };

// Keys that would reach Object.prototype if assigned on a plain object.
const UNSAFE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

export function parseForm(encoded: string): FormFields {
  const root: FormFields = {};
  for (const [key, value] of new URLSearchParams(encoded)) {
    const path = splitKey(key);
    if (path && !path.some((segment) => UNSAFE_KEYS.has(segment))) assign(root, path, value);
  }
  return normaliseFields(root);
}

/** `line_items[0][price]` → ["line_items", "0", "price"]; `expand[]` → ["expand", ""]. */
function splitKey(key: string): string[] | null {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!match) return null;
  const rest = [...match[2].matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]);
  return [match[1], ...rest];
}

function assign(root: FormFields, path: string[], value: string): void {
  let node = root;
  path.forEach((segment, index) => {
    // An empty segment (`a[]`) appends: the next free index.
    const key = segment === "" ? String(Object.keys(node).length) : segment;
    if (index === path.length - 1) {
      node[key] = value;
      return;
    }
    const next = node[key];
    if (typeof next === "object" && !Array.isArray(next)) {
      node = next;
    } else {
      const created: FormFields = {};
      node[key] = created;
      node = created;
    }
  });
}

function normaliseFields(fields: FormFields): FormFields {
  return Object.fromEntries(Object.entries(fields).map(([key, value]) => [key, normaliseValue(value, key)]));
}

/** Objects whose keys are all 0..n-1 become arrays, except metadata, whose keys are the caller's own. */
function normaliseValue(value: FormValue, ownKey: string): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const fields = normaliseFields(value);
  const keys = Object.keys(fields);
  if (ownKey === "metadata" || keys.length === 0 || !keys.every((key) => /^\d+$/.test(key))) return fields;
  return keys.sort((a, b) => Number(a) - Number(b)).map((key) => fields[key]);
}

/** Typed reading of request parameters; every failure is the API's own 400 with the parameter name. */
export class Params {
  constructor(
    readonly fields: FormFields,
    private readonly prefix = "",
  ) {}

  private name(key: string): string {
    return this.prefix ? `${this.prefix}[${key}]` : key;
  }

  has(key: string): boolean {
    return this.fields[key] !== undefined;
  }

  string(key: string): string | undefined {
    const value = this.fields[key];
    if (value === undefined) return undefined;
    if (typeof value !== "string") throw ApiError.invalid(this.name(key), "a string");
    return value;
  }

  requiredString(key: string): string {
    const value = this.string(key);
    if (value === undefined || value === "") throw ApiError.missing(this.name(key));
    return value;
  }

  /** An empty string clears a field, as in the real API. */
  nullableString(key: string): string | null | undefined {
    const value = this.string(key);
    return value === "" ? null : value;
  }

  integer(key: string): number | undefined {
    const value = this.string(key);
    if (value === undefined) return undefined;
    if (!/^-?\d+$/.test(value)) throw ApiError.invalid(this.name(key), "an integer");
    return Number(value);
  }

  requiredInteger(key: string): number {
    const value = this.integer(key);
    if (value === undefined) throw ApiError.missing(this.name(key));
    return value;
  }

  boolean(key: string): boolean | undefined {
    const value = this.string(key);
    if (value === undefined) return undefined;
    if (value !== "true" && value !== "false") throw ApiError.invalid(this.name(key), "a boolean");
    return value === "true";
  }

  oneOf<T extends string>(key: string, allowed: readonly T[]): T | undefined {
    const value = this.string(key);
    if (value === undefined) return undefined;
    const found = allowed.find((option) => option === value);
    if (found === undefined) throw ApiError.invalid(this.name(key), `one of: ${allowed.join(", ")}`);
    return found;
  }

  /** `expand[0]=a&expand[1]=b`, `expand[]=a` or a lone `expand=a`. */
  stringList(key: string): string[] | undefined {
    const value = this.fields[key];
    if (value === undefined) return undefined;
    const list = Array.isArray(value) ? value : [value];
    return list.map((item) => {
      if (typeof item !== "string") throw ApiError.invalid(this.name(key), "a list of strings");
      return item;
    });
  }

  /** Metadata-like maps of strings; an empty value asks to delete that key. */
  stringMap(key: string): Record<string, string> | undefined {
    const value = this.fields[key];
    if (value === undefined) return undefined;
    if (value === "") return {};
    if (typeof value !== "object" || Array.isArray(value)) throw ApiError.invalid(this.name(key), "a hash");
    return Object.fromEntries(
      Object.entries(value).map(([name, item]) => {
        if (typeof item !== "string") throw ApiError.invalid(`${this.name(key)}[${name}]`, "a string");
        return [name, item];
      }),
    );
  }

  nested(key: string): Params | undefined {
    const value = this.fields[key];
    if (value === undefined) return undefined;
    if (typeof value !== "object" || Array.isArray(value)) throw ApiError.invalid(this.name(key), "a hash");
    return new Params(value, this.name(key));
  }

  nestedList(key: string): Params[] | undefined {
    const value = this.fields[key];
    if (value === undefined) return undefined;
    if (!Array.isArray(value)) throw ApiError.invalid(this.name(key), "an array of hashes");
    return value.map((item, index) => {
      if (typeof item !== "object" || Array.isArray(item)) {
        throw ApiError.invalid(`${this.name(key)}[${index}]`, "a hash");
      }
      return new Params(item, `${this.name(key)}[${index}]`);
    });
  }
}

/** Applies a metadata update: merge, an empty value removes the key, an empty map clears all. */
export function mergeMetadata(current: Record<string, string>, update: Record<string, string>): Record<string, string> {
  if (Object.keys(update).length === 0) return {};
  const merged = { ...current };
  for (const [key, value] of Object.entries(update)) {
    if (value === "") delete merged[key];
    else merged[key] = value;
  }
  return merged;
}
