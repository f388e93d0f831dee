import { Link } from "react-router";
import { paths } from "@/config/paths";
import { SIMULATIONS, SIMULATION_IDS } from "@/lab/registry";

/** Compact links to every simulation, for the side of a home page. */
export function LabShortcuts({ headingId, title, intro }: { headingId: string; title: string; intro: string }) {
  return (
    <section aria-labelledby={headingId} className="rounded-lg bg-soot-900 p-5 text-ash-200 md:p-6">
      <h2 id={headingId} className="text-xl font-semibold text-bone-50">
        {title}
      </h2>
      <p className="mt-1.5 text-sm leading-relaxed">{intro}</p>
      <ul className="mt-4 divide-y divide-soot-700 border-y border-soot-700">
        {SIMULATION_IDS.map((id) => (
          <li key={id}>
            <Link
              to={paths.labSimulation(id)}
              className="group flex min-h-11 items-center justify-between gap-3 py-2 font-medium text-bone-50 hover:text-ember-300"
            >
              {SIMULATIONS[id].title}
              <span aria-hidden="true" className="text-ember-400 transition-transform group-hover:translate-x-1">
                →
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
