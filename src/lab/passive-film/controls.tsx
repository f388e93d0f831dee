import type { PassiveFilmParams } from "@shared/sim/passive-film";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { SelectField } from "@/lab/shared-ui/select-field";
import { SliderField } from "@/lab/shared-ui/slider-field";
import { NEIGHBOUR_MODELS, neighbourModelId, type NeighbourModelId } from "./model-options";

interface ControlsProps {
  params: PassiveFilmParams;
  onChange: (patch: Partial<PassiveFilmParams>) => void;
}

/** The alloy, model and environment inputs of the passive-film simulation. */
export function PassiveFilmControls({ params, onChange }: ControlsProps) {
  return (
    <>
      <fieldset className="space-y-3">
        <legend className="eyebrow text-[0.65rem] text-ember-700">Alloy</legend>
        <SliderField label="Chromium" unit="%" min={0} max={30} step={0.5} decimals={1} value={params.crMassPct} onChange={(crMassPct) => onChange({ crMassPct })} hint="Mass % of the steel." />
        <SliderField label="Carbon" unit="%" min={0} max={1.2} step={0.01} value={params.cMassPct} onChange={(cMassPct) => onChange({ cMassPct })} hint="Carbon ties chromium up in carbide." />
        <ChoiceField
          legend="Carbide that forms"
          value={params.carbide}
          choices={[{ value: "M23C6", label: "Cr₂₃C₆" }, { value: "M7C3", label: "Cr₇C₃" }]}
          onChange={(carbide) => onChange({ carbide })}
        />
      </fieldset>
      <fieldset className="space-y-3 border-t border-bone-300 pt-3">
        <legend className="eyebrow text-[0.65rem] text-ember-700">Model</legend>
        <SelectField<NeighbourModelId>
          label="Neighbour model"
          hint="Which Cr sites count as touching (number of neighbours)."
          value={neighbourModelId(params)}
          options={NEIGHBOUR_MODELS}
          onChange={(id) => {
            const m = NEIGHBOUR_MODELS.find((x) => x.value === id)!;
            onChange({ lattice: m.lattice, neighbours: m.neighbours });
          }}
        />
        <ChoiceField
          legend="Connectivity"
          value={params.connectivity}
          choices={[{ value: "bulk", label: "Bulk-like" }, { value: "thin-layer", label: "Thin layer" }]}
          onChange={(connectivity) => onChange({ connectivity })}
        />
        <ChoiceField
          legend="Environment"
          value={params.environment}
          choices={[{ value: "dry", label: "Dry air" }, { value: "humid", label: "Humid air" }, { value: "salt", label: "Salt spray" }]}
          onChange={(environment) => onChange({ environment })}
        />
        <SeedField seed={params.seed} onChange={(seed) => onChange({ seed })} />
      </fieldset>
    </>
  );
}

function SeedField({ seed, onChange }: { seed: number; onChange: (seed: number) => void }) {
  return (
    <div className="flex items-end gap-2">
      <label className="block grow text-sm font-semibold text-soot-800">
        Random seed
        <input
          type="number"
          min={0}
          step={1}
          value={seed}
          onChange={(e) => {
            const v = Math.floor(Number(e.target.value));
            if (Number.isFinite(v) && v >= 0 && v < 2 ** 31) onChange(v);
          }}
          className="mt-1.5 block min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-2 font-mono text-sm"
        />
      </label>
      <button
        type="button"
        className="min-h-10 rounded-sm border border-soot-500/60 bg-white px-3 text-sm font-semibold text-soot-900 hover:border-soot-900"
        onClick={() => onChange((seed * 48271 + 11) % 2147483647)}
      >
        New alloy
      </button>
    </div>
  );
}
