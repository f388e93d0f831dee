import { lazy, Suspense, useEffect, useRef, useState, type ComponentType, type LazyExoticComponent, type RefObject } from "react";
import { Link } from "react-router";
import { paths } from "@/config/paths";
import { Spinner } from "@/components/ui/spinner";
import { isSimulationId, SIMULATIONS, type SimulationId } from "@/lab/registry";
import { EmbedErrorBoundary } from "./error-boundary";

/**
 * What an embedded simulation receives: `initial` (a lesson preset or a quiz's starting
 * state) and, for quiz tasks, `onParamsChange` with its current parameters.
 */
export interface EmbeddedSimulationProps {
  initial?: Record<string, unknown>;
  onParamsChange?: (params: Record<string, unknown>) => void;
}

const views = new Map<SimulationId, LazyExoticComponent<ComponentType<EmbeddedSimulationProps>>>();
function viewFor(id: SimulationId) {
  let view = views.get(id);
  if (!view) {
    view = lazy(SIMULATIONS[id].load as () => Promise<{ default: ComponentType<EmbeddedSimulationProps> }>);
    views.set(id, view);
  }
  return view;
}

/** True once the element has come within a screen or so of the viewport (simulations are heavy). */
function useNearViewport<T extends Element>(): [RefObject<T | null>, boolean] {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(typeof IntersectionObserver === "undefined");
  useEffect(() => {
    if (near || !ref.current) return;
    const observer = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setNear(true), { rootMargin: "600px 0px" });
    observer.observe(ref.current);
    return () => observer.disconnect();
  }, [near]);
  return [ref, near];
}

interface SimulationFrameProps extends EmbeddedSimulationProps {
  id: string;
  task?: string;
  title?: string;
  /** Heading level of the frame's title (lessons: h3 under the section's h2). */
  headingLevel?: 3 | 4;
}

/** An embedded simulation: its guided task above, the simulation loaded when scrolled near, an error boundary around it. */
export function SimulationFrame({ id, task, title, initial, onParamsChange, headingLevel = 3 }: SimulationFrameProps) {
  const [ref, near] = useNearViewport<HTMLDivElement>();
  if (!isSimulationId(id)) {
    return (
      <div className="sim-frame not-prose" role="note">
        <p className="sim-error">This lesson refers to a simulation (“{id}”) that does not exist.</p>
      </div>
    );
  }
  const entry = SIMULATIONS[id];
  const View = viewFor(id);
  const Heading = headingLevel === 3 ? "h3" : "h4";

  return (
    <div ref={ref} className="sim-frame not-prose" data-simulation={id}>
      <div className="sim-frame-head">
        <p className="sim-kicker">Simulation</p>
        <Heading className="sim-title">{title ?? entry.title}</Heading>
        <Link className="sim-open" to={paths.labSimulation(id)}>
          Open in the lab<span className="sr-only">: {entry.title}</span>
        </Link>
      </div>
      {task ? (
        <div className="sim-task">
          <p className="sim-task-label">Your task</p>
          <p className="sim-task-text">{task}</p>
        </div>
      ) : null}
      <div className="sim-stage">
        <EmbedErrorBoundary
          fallback={(message, retry) => (
            <div role="alert" className="sim-error">
              <p>The simulation could not start: {message}</p>
              <button type="button" onClick={retry}>
                Try again
              </button>
            </div>
          )}
        >
          {near ? (
            <Suspense fallback={<Spinner label="Loading the simulation" />}>
              {/* An empty preset still counts: an embedded simulation must not read the lesson page's URL. */}
              <View initial={initial ?? {}} onParamsChange={onParamsChange} />
            </Suspense>
          ) : (
            <p className="sim-placeholder">The simulation loads as you scroll to it.</p>
          )}
        </EmbedErrorBoundary>
      </div>
      <p className="sim-print-note">Interactive simulation “{entry.title}”: open it in the app at {paths.labSimulation(id)}.</p>
    </div>
  );
}

/** The <Simulation> lesson tag. */
export function Simulation({ id, preset, task, title }: { id: string; preset?: Record<string, unknown>; task?: string; title?: string }) {
  return <SimulationFrame id={id} initial={preset} task={task} title={title} />;
}
