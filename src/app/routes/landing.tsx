import { Link } from "react-router";
import { ROLE_HOME } from "@shared/api/roles";
import { useMe } from "@/api/auth";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { Micrograph } from "@/features/landing/micrograph";
import { SIMULATIONS, SIMULATION_IDS } from "@/lab/registry";

const AUDIENCES = [
  {
    who: "Students",
    accent: "border-t-temper-straw",
    what: "Work through the modules your instructor assigns, try each idea in a simulation before you try it at the forge, and check yourself with short quizzes. Your progress is kept for you and your instructor.",
  },
  {
    who: "Instructors",
    accent: "border-t-temper-purple",
    what: "See each cohort at a glance: who has finished which module, which assignments are due, and where a class needs another demonstration.",
  },
  {
    who: "Self-learners",
    accent: "border-t-temper-blue",
    what: "Change an alloy's percentages and watch what moves: corrosion resistance, the carbides that form, hardness after the quench and the effort of sharpening.",
  },
] as const;

const TOPICS = [
  {
    label: "Cr₂O₃",
    title: "Why stainless stays bright",
    text: "The chromium-oxide film a few nanometres thick, the 10.5 % chromium of the standard definition against the 12–13 % smiths count on, and how carbon steals chromium into carbides.",
  },
  {
    label: "M₇C₃",
    title: "Carbides and the edge",
    text: "Iron, chromium, vanadium, tungsten and molybdenum carbides: how hard each is, how many form, and why an edge that lasts is also an edge that is slow to sharpen.",
  },
  {
    label: "Mₛ",
    title: "Hardening and tempering",
    text: "Austenite to martensite in the quench, carbon in solution and hardness, the martensite start temperature, retained austenite and what tempering trades away.",
  },
  {
    label: "L → S",
    title: "From melt to bar",
    text: "How an ingot freezes and segregates, why high-vanadium steels are made from gas-atomised powder, and what hot isostatic pressing does to that powder.",
  },
] as const;

/** Let the last card fill an otherwise half-empty final row (2 columns from sm, 3 from lg). */
function lastCardSpan(index: number, count: number): string | undefined {
  if (index !== count - 1) return undefined;
  const sm = count % 2 === 1 ? "sm:col-span-2" : "";
  const lg = count % 3 === 2 ? "lg:col-span-2" : count % 3 === 1 ? "lg:col-span-3" : "lg:col-span-1";
  return `${sm} ${lg}`.trim();
}

export function Component() {
  const me = useMe();
  const user = me.data ?? null;

  return (
    <>
      <title>Grain &amp; Edge — the metallurgy of blade steel</title>
      <section aria-labelledby="hero-title" className="graticule relative overflow-hidden bg-soot-900 text-bone-50">
        <div className="mx-auto grid max-w-page items-center gap-10 px-gutter pb-14 pt-12 md:grid-cols-[1.15fr_1fr] md:pb-20 md:pt-20">
          <div>
            <p className="eyebrow text-ember-300">Physical metallurgy for bladesmiths</p>
            <h1 id="hero-title" className="mt-4 text-display font-semibold">
              See the steel <span className="italic text-ember-400">behind</span> the edge.
            </h1>
            <p className="mt-6 max-w-prose text-lg leading-relaxed text-ash-200">
              Grain &amp; Edge is a course and a simulation lab on the metallurgy of blade steels. Students of a
              bladesmithing school, their instructors and people learning on their own use it to understand why one
              steel rusts and another stays bright, why one edge holds and another rolls, and what the forge and the
              quench change inside the metal.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              {user ? (
                <ButtonLink to={ROLE_HOME[user.role]} size="lg">
                  Continue where you left off
                </ButtonLink>
              ) : (
                <ButtonLink to={paths.signIn} size="lg">
                  Sign in to your school
                </ButtonLink>
              )}
              <ButtonLink to={paths.lab} variant="onDark" size="lg">
                Explore the simulation lab
              </ButtonLink>
            </div>
          </div>
          <figure className="mx-auto w-full max-w-sm md:max-w-md">
            <Micrograph className="w-full drop-shadow-[0_20px_40px_rgb(242_109_29/0.18)]" />
            <figcaption className="mt-3 text-center font-mono text-xs text-ash-300">
              Illustration: grains and carbides of a hardened steel, as an etched section shows them under the lens.
            </figcaption>
          </figure>
        </div>
      </section>

      <section aria-labelledby="audience-title" className="mx-auto max-w-page px-gutter py-14 md:py-20">
        <p className="eyebrow text-ember-700">Who it is for</p>
        <h2 id="audience-title" className="mt-2 text-3xl font-semibold md:text-4xl">
          One workshop, three ways in
        </h2>
        <ul className="mt-8 grid gap-5 md:grid-cols-3">
          {AUDIENCES.map((audience) => (
            <li
              key={audience.who}
              className={`rounded-lg border border-t-4 border-bone-300 bg-white p-6 shadow-card ${audience.accent}`}
            >
              <h3 className="text-xl font-semibold">{audience.who}</h3>
              <p className="mt-2 leading-relaxed text-soot-700">{audience.what}</p>
              {audience.who === "Self-learners" ? (
                <Link to={paths.join} className="mt-3 inline-block font-semibold text-quench-700 underline underline-offset-4 hover:text-quench-800">
                  Get a self-study pass
                </Link>
              ) : null}
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="topics-title" className="border-y border-bone-300 bg-bone-100">
        <div className="mx-auto max-w-page px-gutter py-14 md:py-20">
          <p className="eyebrow text-ember-700">What you will learn</p>
          <h2 id="topics-title" className="mt-2 max-w-2xl text-3xl font-semibold md:text-4xl">
            The science a smith meets at the anvil, the quench tank and the stone
          </h2>
          <ol className="mt-10 grid gap-x-10 gap-y-8 md:grid-cols-2">
            {TOPICS.map((topic, index) => (
              <li key={topic.title} className="grid grid-cols-[auto_1fr] gap-4">
                <span
                  aria-hidden="true"
                  className="mt-0.5 flex h-9 w-20 items-center justify-center rounded-sm bg-soot-900 font-mono text-sm font-semibold whitespace-nowrap text-ember-300 shadow-[inset_0_-3px_0_var(--color-ember-600)]"
                >
                  {topic.label}
                </span>
                <div>
                  <h3 className="text-xl font-semibold">
                    <span className="sr-only">{index + 1}. </span>
                    {topic.title}
                  </h3>
                  <p className="mt-1.5 leading-relaxed text-soot-700">{topic.text}</p>
                </div>
              </li>
            ))}
          </ol>
        </div>
      </section>

      <section aria-labelledby="lab-title" className="mx-auto max-w-page px-gutter py-14 md:py-20">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <div>
            <p className="eyebrow text-ember-700">The lab</p>
            <h2 id="lab-title" className="mt-2 text-3xl font-semibold md:text-4xl">
              Change the alloy. Watch what happens.
            </h2>
          </div>
          <Link to={paths.lab} className="font-semibold text-quench-700 underline underline-offset-4 hover:text-quench-800">
            All simulations
          </Link>
        </div>
        <ul className="mt-8 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {SIMULATION_IDS.map((id, index) => (
            <li key={id} className={lastCardSpan(index, SIMULATION_IDS.length)}>
              <Link
                to={paths.labSimulation(id)}
                className="group block h-full rounded-lg border border-bone-300 bg-white p-5 shadow-card transition-colors hover:border-ember-500"
              >
                <span className="flex items-baseline justify-between gap-3">
                  <span className="font-display text-lg font-semibold text-soot-900 group-hover:text-ember-700">
                    {SIMULATIONS[id].title}
                  </span>
                  <span aria-hidden="true" className="text-ember-600 transition-transform group-hover:translate-x-1">
                    →
                  </span>
                </span>
                <span className="mt-2 block text-sm leading-relaxed text-soot-700">{SIMULATIONS[id].summary}</span>
              </Link>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="safety-title" className="mx-auto max-w-page px-gutter pb-16">
        <div className="rounded-lg border-l-4 border-ember-500 bg-soot-900 p-6 text-ash-200 md:p-8">
          <h2 id="safety-title" className="text-2xl font-semibold text-bone-50">
            Learn here, practise safely there
          </h2>
          <p className="mt-3 max-w-3xl leading-relaxed">
            The simulations are models for understanding, not recipes. Hot metal, quench oil, grinding dust and
            etching acids injure people every year: follow your local codes, the manufacturers&rsquo; safety data
            sheets and the supervision of a qualified instructor whenever you work at the forge.
          </p>
        </div>
      </section>
    </>
  );
}
