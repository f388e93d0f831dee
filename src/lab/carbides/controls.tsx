import { findGrade } from "@shared/metallurgy";
import { CARBIDE_PRESET_GRADES, type CarbideParams, type ResolvedAlloy } from "@shared/sim/carbides";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { SelectField } from "@/lab/shared-ui/select-field";
import { SliderField } from "@/lab/shared-ui/slider-field";

interface ControlsProps {
  params: CarbideParams;
  alloy: ResolvedAlloy;
  hours: number;
  onChange: (patch: Partial<CarbideParams>) => void;
  onHours: (hours: number) => void;
  onPreset: (gradeId: string) => void;
}

const ELEMENTS = [
  { key: "C", label: "Carbon", max: 3.5, step: 0.01 },
  { key: "Cr", label: "Chromium", max: 30, step: 0.1 },
  { key: "V", label: "Vanadium", max: 15, step: 0.05 },
  { key: "W", label: "Tungsten", max: 20, step: 0.1 },
  { key: "Mo", label: "Molybdenum", max: 12, step: 0.05 },
] as const;

/** Steel, heat treatment, coarsening, stone and field inputs of the carbide simulation. */
export function CarbideControls({ params, alloy, hours, onChange, onHours, onPreset }: ControlsProps) {
  const presetValue = alloy.gradeId && (CARBIDE_PRESET_GRADES as readonly string[]).includes(alloy.gradeId) ? alloy.gradeId : "custom";
  return (
    <>
      <fieldset className="space-y-3">
        <legend className="eyebrow text-[0.65rem] text-ember-700">Steel</legend>
        <SelectField
          label="Preset grade"
          value={presetValue}
          options={[
            ...CARBIDE_PRESET_GRADES.map((id) => ({ value: id, label: findGrade(id)!.label })),
            ...(presetValue === "custom" ? [{ value: "custom", label: alloy.label }] : []),
          ]}
          onChange={(id) => { if (id !== "custom") onPreset(id); }}
          hint={alloy.gradeId ? findGrade(alloy.gradeId)?.description : "Composition set by hand."}
        />
        {ELEMENTS.map((el) => (
          <SliderField
            key={el.key}
            label={el.label}
            unit="%"
            min={0}
            max={el.max}
            step={el.step}
            value={alloy.composition[el.key] ?? 0}
            onChange={(v) => onChange({ [el.key]: v })}
          />
        ))}
      </fieldset>
      <fieldset className="space-y-3 border-t border-bone-300 pt-3">
        <legend className="eyebrow text-[0.65rem] text-ember-700">Heat treatment</legend>
        <ChoiceField
          legend="State"
          value={params.state}
          choices={[{ value: "annealed", label: "Annealed" }, { value: "hardened", label: "Hardened" }]}
          onChange={(state) => onChange({ state })}
        />
        <SliderField
          label="Austenitizing temperature"
          unit="°C"
          min={760}
          max={1200}
          step={5}
          decimals={0}
          value={alloy.austenitizingTempC}
          onChange={(austenitizingTempC) => onChange({ austenitizingTempC })}
          hint="Sets how much carbide dissolves when hardened, and the coarsening rate."
        />
        <SliderField
          label="Time at temperature"
          unit="h"
          min={0}
          max={100}
          step={0.5}
          decimals={1}
          value={hours}
          onChange={onHours}
          hint="Carbides coarsen (LSW ripening). Play runs this clock."
        />
      </fieldset>
      <fieldset className="space-y-3 border-t border-bone-300 pt-3">
        <legend className="eyebrow text-[0.65rem] text-ember-700">Stone and field</legend>
        <ChoiceField
          legend="Sharpening stone"
          value={params.abrasive}
          choices={[{ value: "alumina", label: "Aluminium oxide" }, { value: "silicon-carbide", label: "Silicon carbide" }, { value: "diamond", label: "Diamond" }]}
          onChange={(abrasive) => onChange({ abrasive })}
        />
        <ChoiceField
          legend="Particle sizes"
          value={params.sizeModel}
          choices={[{ value: "lognormal", label: "Log-normal" }, { value: "lsw", label: "LSW" }]}
          onChange={(sizeModel) => onChange({ sizeModel })}
        />
        <button
          type="button"
          className="min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-3 text-sm font-semibold text-soot-900 hover:border-soot-900"
          onClick={() => onChange({ seed: (params.seed * 48271 + 11) % 2147483647 })}
        >
          Draw a new field (seed {params.seed})
        </button>
      </fieldset>
    </>
  );
}
