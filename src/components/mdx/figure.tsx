import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from "react";
import { Spinner } from "@/components/ui/spinner";
import { EmbedErrorBoundary } from "./error-boundary";
import { isFigureId, type FigureId } from "./tags";

/** Each built-in figure is its own chunk: recharts loads only with the first figure on a page. */
const LOADERS: Record<FigureId, () => Promise<{ default: ComponentType }>> = {
  "iron-carbon-diagram": () => import("./figures/iron-carbon-diagram"),
  "spanning-curve": () => import("./figures/spanning-curve"),
  "scheil-curve": () => import("./figures/scheil-curve"),
  "hardness-vs-carbon": () => import("./figures/hardness-vs-carbon"),
  "tempering-parameter": () => import("./figures/tempering-parameter"),
  "cooling-rate-vs-diameter": () => import("./figures/cooling-rate-vs-diameter"),
  "carbide-hardness": () => import("./figures/carbide-hardness"),
};

const views = new Map<FigureId, LazyExoticComponent<ComponentType>>();
function viewFor(id: FigureId) {
  let view = views.get(id);
  if (!view) {
    view = lazy(LOADERS[id]);
    views.set(id, view);
  }
  return view;
}

/** A built-in figure drawn from the science core, with its caption. */
export function Figure({ id, caption }: { id: string; caption?: string }) {
  if (!isFigureId(id)) return <p className="sim-error">Unknown figure “{id}”.</p>;
  const View = viewFor(id);
  return (
    <figure className="lesson-figure not-prose">
      <div className="lesson-figure-body">
        <EmbedErrorBoundary fallback={(message) => <p role="alert" className="sim-error">This figure could not be drawn: {message}</p>}>
          <Suspense fallback={<Spinner label="Drawing the figure" />}>
            <View />
          </Suspense>
        </EmbedErrorBoundary>
      </div>
      {caption ? (
        <figcaption className="lesson-figure-caption">
          {caption} <span className="lesson-figure-source">Drawn by the app's science core.</span>
        </figcaption>
      ) : null}
    </figure>
  );
}
