import { GRADE_PRESETS, findGrade } from "@shared/metallurgy/grades";
import { GASES, POWDER_RANGES, type AtomisingGas, type ResolvedPowderParams } from "@shared/sim/powder/params";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { SelectField } from "@/lab/shared-ui/select-field";
import { SliderField } from "@/lab/shared-ui/slider-field";

interface PowderControlsProps {
  params: ResolvedPowderParams;
  onChange: (next: ResolvedPowderParams) => void;
}

export function PowderControls({ params, onChange }: PowderControlsProps) {
  const patch = (p: Partial<ResolvedPowderParams>) => onChange({ ...params, ...p });
  const slider = (key: keyof typeof POWDER_RANGES, label: string, unit: string, hint?: string) => (
    <SliderField
      label={label}
      value={params[key]}
      min={POWDER_RANGES[key].min}
      max={POWDER_RANGES[key].max}
      step={POWDER_RANGES[key].step}
      unit={unit}
      hint={hint}
      onChange={(v) => patch({ [key]: v } as Partial<ResolvedPowderParams>)}
    />
  );
  return (
    <>
      <SelectField
        label="Steel"
        value={params.grade}
        options={GRADE_PRESETS.map((g) => ({ value: g.id, label: g.label }))}
        hint={findGrade(params.grade)?.description}
        onChange={(grade) => patch({ grade, composition: { ...(findGrade(grade)?.composition ?? {}) } })}
      />
      <fieldset className="space-y-3">
        <legend className="text-sm font-semibold text-soot-800">Atomising</legend>
        {slider("medianDiameterUm", "Median droplet size (by mass)", "µm")}
        {slider("geometricStdDev", "Spread of sizes (σg)", "", "D84/D50; gas atomisers give about 2.0–2.3.")}
        <ChoiceField<AtomisingGas>
          legend="Gas"
          value={params.gas}
          choices={GASES.map((g) => ({ value: g, label: g === "N2" ? "Nitrogen (N₂)" : "Argon (Ar)" }))}
          onChange={(gas) => patch({ gas })}
        />
        {slider("gasVelocityMPerS", "Gas velocity", "m/s")}
        {slider("superheatC", "Superheat above the liquidus", "°C")}
        {slider("undercoolingK", "Nucleation undercooling", "K", "How far below the liquidus a droplet cools before its first crystal forms.")}
      </fieldset>
      <fieldset className="space-y-3">
        <legend className="text-sm font-semibold text-soot-800">Consolidation (hot isostatic pressing)</legend>
        {slider("hipPressureMPa", "Gas pressure", "MPa")}
        {slider("hipTempC", "Temperature", "°C")}
      </fieldset>
    </>
  );
}
