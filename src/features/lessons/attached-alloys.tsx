/**
 * Alloys an instructor attached to this lesson's task: each opens in the alloy explorer, all of
 * them (up to three) open side by side, and the instructor who owns one can take it off again.
 * Nothing shows while there are none, so a lesson without a task looks as before.
 */
import { useState } from "react";
import { Link } from "react-router";
import type { AttachedAlloy } from "@shared/api/alloys";
import { compositionText } from "@shared/sim/alloy/format";
import { ALLOY_ELEMENTS, MAX_ALLOYS, type CustomAlloySpec } from "@shared/sim/alloy/params";
import { alloyLinkQuery } from "@shared/sim/alloy/url-state";
import { useAttachedAlloys, useDetachAlloy } from "@/api/alloys";
import { isApiError } from "@/api/client";
import { buttonClasses } from "@/components/ui/button";
import { paths } from "@/config/paths";

function toSpec(attachment: AttachedAlloy): CustomAlloySpec {
  const spec: CustomAlloySpec = { name: attachment.name };
  for (const el of ALLOY_ELEMENTS) {
    const v = attachment.composition[el];
    if (typeof v === "number" && v > 0) spec[el] = v;
  }
  return spec;
}

const explorerLink = (attachments: readonly AttachedAlloy[]) => `${paths.labSimulation("alloy")}?${alloyLinkQuery(attachments.map(toSpec))}`;

export function AttachedAlloys({ lessonSlug }: { lessonSlug: string }) {
  const attached = useAttachedAlloys(lessonSlug);
  // A failed or empty list leaves the lesson as it is: the task alloys are an extra, not the lesson.
  if (!attached.data || attached.data.length === 0) return null;
  const alloys = attached.data;
  return (
    <section aria-labelledby="task-alloys" className="print-hide mb-10 overflow-hidden rounded-lg border border-quench-500/30 bg-white shadow-card">
      <div className="border-b border-quench-500/20 bg-quench-100 px-5 py-3">
        <h2 id="task-alloys" className="eyebrow text-quench-800">
          Task alloys from your instructor
        </h2>
        <p className="mt-1 text-sm text-soot-700">
          Open {alloys.length === 1 ? "it" : "each"} in the alloy explorer and compare what the lesson predicts with what the explorer computes.
        </p>
      </div>
      <ul className="divide-y divide-bone-200">
        {alloys.map((alloy) => (
          <AttachedAlloyItem key={alloy.id} alloy={alloy} lessonSlug={lessonSlug} />
        ))}
      </ul>
      {alloys.length > 1 ? (
        <div className="border-t border-bone-200 bg-bone-50 px-5 py-3">
          <Link to={explorerLink(alloys)} className={buttonClasses("secondary")}>
            Compare {alloys.length > MAX_ALLOYS ? `the first ${MAX_ALLOYS}` : `all ${alloys.length}`} side by side
          </Link>
        </div>
      ) : null}
    </section>
  );
}

function AttachedAlloyItem({ alloy, lessonSlug }: { alloy: AttachedAlloy; lessonSlug: string }) {
  const detach = useDetachAlloy();
  const [confirming, setConfirming] = useState(false);
  return (
    <li className="px-5 py-4">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h3 className="font-display text-lg font-semibold text-soot-900">{alloy.name}</h3>
        <p className="text-xs text-soot-600">Attached by {alloy.attachedBy || "an instructor"}</p>
      </div>
      <p className="mt-1 text-sm text-soot-800">
        <span className="sr-only">Composition in mass percent: </span>
        <span className="font-mono">{compositionText(alloy.composition)}</span>
        <span className="text-xs text-soot-600"> · mass %, iron the balance</span>
      </p>
      {alloy.note ? <p className="mt-2 border-l-2 border-ember-500 pl-3 text-[0.95rem] leading-relaxed text-soot-800">{alloy.note}</p> : null}
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <Link to={explorerLink([alloy])} className={buttonClasses("primary")} aria-label={`Open ${alloy.name} in the alloy explorer`}>
          Open in the alloy explorer
        </Link>
        {alloy.yours && !confirming ? (
          <button type="button" className={buttonClasses("ghost")} onClick={() => setConfirming(true)}>
            Remove from this lesson
          </button>
        ) : null}
        {alloy.yours && confirming ? (
          <span className="flex flex-wrap items-center gap-2 text-sm text-soot-800">
            Remove it for every reader? Your saved alloy stays.
            <button
              type="button"
              className={buttonClasses("secondary")}
              disabled={detach.isPending}
              onClick={() => detach.mutate({ alloyId: alloy.alloyId, lessonSlug }, { onSettled: () => setConfirming(false) })}
            >
              Remove
            </button>
            <button type="button" className={buttonClasses("ghost")} onClick={() => setConfirming(false)}>
              Keep
            </button>
          </span>
        ) : null}
      </div>
      {detach.isError ? (
        <p role="alert" className="mt-2 text-sm text-danger-700">
          {isApiError(detach.error) ? detach.error.message : "The alloy could not be removed. Try again."}
        </p>
      ) : null}
    </li>
  );
}
