/** Interim page for the alloy explorer; the explorer itself replaces this file. */
export default function AlloyExplorer() {
  return (
    <div className="prose prose-stone max-w-prose">
      <p>
        The alloy explorer takes a composition in mass per cent of carbon, chromium, vanadium, tungsten, molybdenum,
        manganese, silicon, nickel and nitrogen, and compares up to three alloys side by side.
      </p>
      <p>For each alloy it will compute:</p>
      <ul>
        <li>stainless or not by the standard definition, chromium free in the matrix, and the pitting resistance equivalent number;</li>
        <li>carbide types and volume fractions, as-quenched hardness, the martensite start temperature and retained austenite;</li>
        <li>edge-retention and sharpening-effort indices, the freezing range, and the ideal critical diameter for hardening.</li>
      </ul>
    </div>
  );
}
