import { CODE_EDITIONS, DESIGN_CAUTION } from "@spanwright/solver/design";

/** The caution and the code editions every check page carries. */
export function DesignCaution() {
  return (
    <aside className="space-y-2 rounded-md border border-paper-300 bg-caution-50 px-4 py-3 text-xs text-caution-700" aria-label="Caution and code editions">
      <p>
        <span className="font-semibold">Caution: </span>
        {DESIGN_CAUTION}
      </p>
      <div>
        <p className="font-semibold">Code editions used</p>
        <ul className="mt-1 space-y-0.5">
          {CODE_EDITIONS.map((e) => (
            <li key={e.id}>
              <span className="font-medium">{e.id}</span>, {e.title}: {e.usedFor}
            </li>
          ))}
        </ul>
      </div>
    </aside>
  );
}
