import { existsSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { ApiError } from "./api-error";
import type { Params } from "./form";
import type { ApiObject, Kind, ListObject, ObjectOf, StandinEvent } from "./objects";

export type DeliveryAttempt = {
  attempt: number;
  at: number;
  /** The receiver's HTTP status, or null when it could not be reached. */
  status: number | null;
  error: string | null;
  redelivery: boolean;
};

export type EventRecord = { event: StandinEvent; deliveries: DeliveryAttempt[]; delivered: boolean };

type Snapshot = { objects: ApiObject[]; events: EventRecord[] };

/** Everything the stand-in knows, in memory; optionally written to a JSON file so a restart keeps it. */
export class Store {
  private objects = new Map<string, ApiObject>();
  private eventList: EventRecord[] = [];

  constructor(private readonly file?: string) {
    if (file && existsSync(file)) {
      const snapshot = JSON.parse(readFileSync(file, "utf8")) as Snapshot;
      for (const object of snapshot.objects) this.objects.set(object.id, object);
      this.eventList = snapshot.events;
    }
  }

  insert<T extends ApiObject>(object: T): T {
    this.objects.set(object.id, object);
    return object;
  }

  findById(id: string): ApiObject | undefined {
    return this.objects.get(id);
  }

  find<K extends Kind>(kind: K, id: string): ObjectOf<K> | undefined {
    const object = this.objects.get(id);
    return object && isKind(object, kind) ? object : undefined;
  }

  /** The object or the API's 404; `param` names the request field that carried the id. */
  get<K extends Kind>(kind: K, id: string, param = "id"): ObjectOf<K> {
    const object = this.find(kind, id);
    if (!object) throw ApiError.notFound(kind, id, param);
    return object;
  }

  /** Newest first, like every list in the real API. */
  list<K extends Kind>(kind: K, keep: (object: ObjectOf<K>) => boolean = () => true): ObjectOf<K>[] {
    const found: ObjectOf<K>[] = [];
    for (const object of this.objects.values()) {
      if (isKind(object, kind) && keep(object)) found.push(object);
    }
    return found.reverse();
  }

  addEvent(event: StandinEvent): EventRecord {
    const record: EventRecord = { event, deliveries: [], delivered: false };
    this.eventList.push(record);
    return record;
  }

  event(id: string): EventRecord {
    const record = this.eventList.find((candidate) => candidate.event.id === id);
    if (!record) throw ApiError.notFound("event", id);
    return record;
  }

  /** Oldest first: the order they were sent in. */
  events(): readonly EventRecord[] {
    return this.eventList;
  }

  clear(): void {
    this.objects.clear();
    this.eventList = [];
    this.save();
  }

  save(): void {
    if (!this.file) return;
    const snapshot: Snapshot = { objects: [...this.objects.values()], events: this.eventList };
    // Write then rename, so a crash mid-write never leaves half a file behind.
    writeFileSync(`${this.file}.tmp`, JSON.stringify(snapshot));
    renameSync(`${this.file}.tmp`, this.file);
  }
}

function isKind<K extends Kind>(object: ApiObject, kind: K): object is ObjectOf<K> {
  return object.object === kind;
}

/** Cursor pagination as the real API does it: `limit` (1–100, default 10), `starting_after`, `ending_before`. */
export function paginate<T extends { id: string }>(items: T[], query: Params, url: string): ListObject<T> {
  const limit = query.integer("limit") ?? 10;
  if (limit < 1 || limit > 100) throw ApiError.invalid("limit", "between 1 and 100");
  const after = query.string("starting_after");
  const before = query.string("ending_before");
  let window = items;
  if (after) {
    const index = items.findIndex((item) => item.id === after);
    if (index < 0) throw ApiError.notFound("object", after, "starting_after");
    window = items.slice(index + 1);
  } else if (before) {
    const index = items.findIndex((item) => item.id === before);
    if (index < 0) throw ApiError.notFound("object", before, "ending_before");
    const start = Math.max(0, index - limit);
    return { object: "list", data: items.slice(start, index), has_more: start > 0, url };
  }
  return { object: "list", data: window.slice(0, limit), has_more: window.length > limit, url };
}

/**
 * A response copy of a stored object: `line_items` dropped unless expanded (the real API treats it as
 * includable), and id fields named in `expand` (dotted paths such as `subscription.latest_invoice`)
 * replaced by the objects they name.
 */
export function render<T extends ApiObject>(store: Store, object: T, expand: string[] = []): T {
  const copy = structuredClone(object);
  if (copy.object === "checkout.session" && !expand.includes("line_items")) delete copy.line_items;
  for (const path of expand) expandPath(store, copy, path.split("."));
  return copy;
}

/** A list page rendered item by item; expansions are written `data.customer` as in the real API. */
export function renderList<T extends ApiObject>(
  store: Store,
  list: ListObject<T>,
  expand: string[] = [],
): ListObject<T> {
  const itemExpand = expand.filter((path) => path.startsWith("data.")).map((path) => path.slice("data.".length));
  return { ...list, data: list.data.map((item) => render(store, item, itemExpand)) };
}

function expandPath(store: Store, value: unknown, path: string[]): void {
  if (path.length === 0) return;
  if (Array.isArray(value)) {
    for (const item of value) expandPath(store, item, path);
    return;
  }
  if (!isRecord(value)) return;
  const [field, ...rest] = path;
  const current = value[field];
  if (typeof current === "string") {
    const found = store.findById(current);
    if (found) value[field] = render(store, found);
  }
  expandPath(store, value[field], rest);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}
