/**
 * The contracts' zod schemas, loaded as their own chunk the first time a response is checked, so
 * the entry chunk (the app shell and the sign-in page) carries no zod. Modules the entry imports
 * use `parseWith` and take only types and `routePath` (from "@spanwright/contracts/routes") from
 * the contracts; page chunks may import the contracts directly.
 */
type Contracts = typeof import("@spanwright/contracts");
type SchemaName = { [K in keyof Contracts]: K extends `${string}ResponseSchema` ? K : never }[keyof Contracts];

let contracts: Promise<Contracts> | null = null;

/** Starts loading the schemas' chunk (once); pages that will check a response soon may call it early. */
export function loadSchemas(): Promise<Contracts> {
  contracts ??= import("@spanwright/contracts");
  return contracts;
}

/** A response parser for request(): the named response schema's parse, once its chunk is loaded. */
export function parseWith<K extends SchemaName>(name: K): (data: unknown) => Promise<ReturnType<Contracts[K]["parse"]>> {
  return async (data) => (await loadSchemas())[name].parse(data) as ReturnType<Contracts[K]["parse"]>;
}
