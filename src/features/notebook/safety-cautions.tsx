/**
 * The cautions the entry form (and each entry) shows. Short, practical, and deferring to the
 * rules and documents that actually govern a workshop: local codes, the manufacturers' data
 * sheets and safety data sheets, and licensed or qualified supervision.
 */
import { cx } from "@/components/ui/cx";

const CAUTIONS: { id: string; title: string; points: string[] }[] = [
  {
    id: "quench",
    title: "Quenching in oil",
    points: [
      "Use a quench oil whose flash point is far above what the hot blade will bring it to, and heat the oil only to the temperature its data sheet gives.",
      "Keep a metal lid within reach to smother a flare-up, and a fire extinguisher rated for oil fires. Never put water on burning oil.",
      "Quench outdoors or under extraction: hot oil gives off smoke and fumes.",
      "Wear a face shield, leather gloves and apron, natural-fibre clothes and closed leather shoes. Oil can spit when the blade goes in.",
    ],
  },
  {
    id: "hot-metal",
    title: "Hot metal",
    points: ["Steel at tempering heat looks exactly like cold steel. Put hot pieces in a marked place and handle them with tongs."],
  },
  {
    id: "cold",
    title: "Dry ice and liquid nitrogen",
    points: ["Use insulated gloves and eye protection, work where air moves freely (both displace oxygen), and never close them in a sealed container."],
  },
  {
    id: "grinding",
    title: "Grinding dust",
    points: [
      "Wear eye protection and a respirator rated for fine dust, and use dust extraction.",
      "Keep sparks away from oily rags, wood dust and the quench tank; metal and wood dust together can smoulder.",
    ],
  },
  {
    id: "etching",
    title: "Etching",
    points: [
      "Etchants such as ferric chloride and acids burn skin and eyes: gloves, goggles and ventilation. Add acid to water, never water to acid.",
      "Neutralise and dispose of spent etchant the way your local rules require.",
    ],
  },
];

export function SafetyCautions({ className, compact = false }: { className?: string; compact?: boolean }) {
  return (
    <aside aria-labelledby="safety-heading" id="safety" className={cx("rounded-lg border-l-4 border-ember-500 bg-soot-900 p-5 text-bone-50 shadow-forge", className)}>
      <p className="eyebrow text-ember-300">Safety</p>
      <h2 id="safety-heading" className="mt-1 text-xl font-semibold">
        Before you heat, quench, grind or etch
      </h2>
      <p className="mt-2 text-sm leading-relaxed text-ash-200">
        These are reminders, not a full procedure. Follow your local fire and workplace codes, the steel maker&rsquo;s heat-treatment data sheet and
        the safety data sheets of oils and chemicals, and work under licensed or qualified supervision.
      </p>
      {compact ? null : (
        <div className="mt-4 space-y-4">
          {CAUTIONS.map((c) => (
            <div key={c.id}>
              <h3 className="font-sans text-sm font-semibold text-ember-200">{c.title}</h3>
              <ul className="mt-1.5 list-disc space-y-1 pl-5 text-sm leading-relaxed text-bone-100 marker:text-ember-400">
                {c.points.map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </ul>
            </div>
          ))}
        </div>
      )}
    </aside>
  );
}
