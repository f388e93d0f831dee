import { Link } from "react-router";
import { paths } from "@/config/paths";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { SIMULATIONS, SIMULATION_IDS } from "@/lab/registry";

export function Component() {
  return (
    <>
      <title>Simulation lab — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="Simulation lab"
        title="Models you can take apart"
        lede="Each simulation runs a published or clearly labelled model of what happens inside a blade steel. Change the inputs and watch the result; every page says how it is computed and where the model stops being valid."
      />
      <PageBody>
        <ul className="grid gap-5 md:grid-cols-2">
          {SIMULATION_IDS.map((id, index) => (
            <li key={id}>
              <Link
                to={paths.labSimulation(id)}
                className="group flex h-full gap-4 rounded-lg border border-bone-300 bg-white p-6 shadow-card transition-colors hover:border-ember-500"
              >
                <span
                  aria-hidden="true"
                  className="flex size-11 shrink-0 items-center justify-center rounded-full bg-soot-900 font-mono text-sm font-semibold text-ember-300"
                >
                  {String(index + 1).padStart(2, "0")}
                </span>
                <span>
                  <span className="block font-display text-xl font-semibold text-soot-900 group-hover:text-ember-700">
                    {SIMULATIONS[id].title}
                  </span>
                  <span className="mt-2 block leading-relaxed text-soot-700">{SIMULATIONS[id].summary}</span>
                  <span className="mt-3 flex flex-wrap gap-2">
                    {SIMULATIONS[id].topics.map((topic) => (
                      <span key={topic} className="rounded-xs bg-quench-100 px-2 py-0.5 font-mono text-xs text-quench-800">
                        {topic}
                      </span>
                    ))}
                  </span>
                </span>
              </Link>
            </li>
          ))}
        </ul>
      </PageBody>
    </>
  );
}
