import { Link } from "react-router";
import { paths } from "@/config/paths";
import { LogoMark } from "@/components/ui/logo-mark";

export function SiteFooter() {
  return (
    <footer className="mt-auto bg-soot-950 text-ash-300">
      <div className="temper-ribbon opacity-80" aria-hidden="true" />
      <div className="mx-auto grid max-w-page gap-6 px-gutter py-8 text-sm md:grid-cols-[1fr_auto] md:items-start">
        <div className="max-w-prose">
          <p className="flex items-center gap-2 font-display text-base text-bone-100">
            <LogoMark className="size-6" /> Grain &amp; Edge
          </p>
          <p className="mt-3 leading-relaxed">
            <strong className="font-semibold text-ember-300">Safety:</strong> forging, quenching in oil, grinding and
            etching carry real risks of burns, fire, dust and acid injury. This course explains the science; for
            practice, follow your local codes, the manufacturers&rsquo; safety data sheets and qualified supervision.
          </p>
        </div>
        <nav aria-label="Footer">
          <ul className="flex gap-5 md:flex-col md:gap-2 md:text-right">
            <li>
              <Link className="underline-offset-4 hover:text-bone-50 hover:underline" to={paths.home}>
                About
              </Link>
            </li>
            <li>
              <Link className="underline-offset-4 hover:text-bone-50 hover:underline" to={paths.lab}>
                Simulation lab
              </Link>
            </li>
          </ul>
        </nav>
      </div>
    </footer>
  );
}
