import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from "react";
import { data, Link, useParams, type LoaderFunctionArgs } from "react-router";
import { paths } from "@/config/paths";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { isSimulationId, SIMULATIONS, type SimulationId } from "@/lab/registry";

// One lazy component per simulation, created once so React keeps its state across renders.
const lazyViews = new Map<SimulationId, LazyExoticComponent<ComponentType>>();
function viewFor(id: SimulationId) {
  let view = lazyViews.get(id);
  if (!view) {
    view = lazy(SIMULATIONS[id].load);
    lazyViews.set(id, view);
  }
  return view;
}

export async function loader({ params }: LoaderFunctionArgs) {
  if (!isSimulationId(params.simId)) throw data(null, { status: 404 });
  // Start downloading the simulation's chunk during navigation rather than after it.
  await SIMULATIONS[params.simId].load();
  return null;
}

export function Component() {
  const { simId } = useParams();
  if (!isSimulationId(simId)) return null;
  const entry = SIMULATIONS[simId];
  const View = viewFor(simId);

  return (
    <>
      <title>{`${entry.title} — Simulation lab — Grain & Edge`}</title>
      <PageHeader eyebrow="Simulation lab" title={entry.title} lede={entry.summary} />
      <PageBody>
        <nav aria-label="Breadcrumb" className="mb-6 text-sm">
          <Link to={paths.lab} className="font-semibold text-quench-700 underline underline-offset-4">
            ← All simulations
          </Link>
        </nav>
        <Suspense fallback={<Spinner label="Loading the simulation" />}>
          <View />
        </Suspense>
      </PageBody>
    </>
  );
}
