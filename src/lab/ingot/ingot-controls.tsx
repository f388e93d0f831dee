import { GRADE_PRESETS, findGrade } from "@shared/metallurgy/grades";
import { ELEMENT_RANGE_MASS_PCT } from "@shared/sim/alloy/element-ranges";
import { INGOT_ELEMENTS, MOULDS, SIZE_RANGE_MM, type IngotElement, type Mould, type ResolvedIngotSimParams } from "@shared/sim/ingot/params";
import { describeMixing } from "@shared/sim/ingot/mixing";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { SelectField } from "@/lab/shared-ui/select-field";
import { SliderField } from "@/lab/shared-ui/slider-field";
import { MOULD_STYLE } from "./palette";

const ELEMENT_NAMES: Record<IngotElement, string> = {
  C: "Carbon",
  Cr: "Chromium",
  V: "Vanadium",
  Mo: "Molybdenum",
  Mn: "Manganese",
  Si: "Silicon",
};

const CUSTOM = "custom";

interface IngotControlsProps {
  sim: ResolvedIngotSimParams;
  onChange: (next: ResolvedIngotSimParams) => void;
}

export function IngotControls({ sim, onChange }: IngotControlsProps) {
  const patch = (p: Partial<ResolvedIngotSimParams>) => onChange({ ...sim, ...p });
  const gradeOptions = [
    ...GRADE_PRESETS.map((g) => ({ value: g.id, label: g.label })),
    ...(sim.gradeId === null ? [{ value: CUSTOM, label: "Custom composition" }] : []),
  ];
  const setElement = (el: IngotElement, value: number) => {
    const composition = { ...sim.composition };
    if (value > 0) composition[el] = value;
    else delete composition[el];
    patch({ composition, gradeId: null });
  };

  return (
    <>
      <SelectField
        label="Steel"
        value={sim.gradeId ?? CUSTOM}
        options={gradeOptions}
        hint={sim.gradeId ? findGrade(sim.gradeId)?.description : "Your own composition (moved sliders)."}
        onChange={(id) => {
          const grade = findGrade(id);
          if (!grade) return;
          const composition = Object.fromEntries(INGOT_ELEMENTS.filter((el) => (grade.composition[el] ?? 0) > 0).map((el) => [el, grade.composition[el]!]));
          patch({ gradeId: id, composition });
        }}
      />
      <fieldset className="space-y-3">
        <legend className="text-sm font-semibold text-soot-800">Composition, mass %</legend>
        {INGOT_ELEMENTS.map((el) => (
          <SliderField
            key={el}
            label={`${ELEMENT_NAMES[el]} (${el})`}
            value={sim.composition[el] ?? 0}
            min={ELEMENT_RANGE_MASS_PCT[el].min}
            max={ELEMENT_RANGE_MASS_PCT[el].max}
            step={ELEMENT_RANGE_MASS_PCT[el].step}
            unit="%"
            onChange={(v) => setElement(el, v)}
          />
        ))}
      </fieldset>
      <SliderField
        label="Ingot diameter"
        value={sim.sizeMm}
        min={SIZE_RANGE_MM.min}
        max={SIZE_RANGE_MM.max}
        step={10}
        unit="mm"
        onChange={(sizeMm) => patch({ sizeMm })}
      />
      <ChoiceField<Mould>
        legend="Mould and cooling"
        value={sim.mould}
        choices={MOULDS.map((m) => ({ value: m, label: MOULD_STYLE[m].label.replace(" ingot mould", "").replace(" mould", "") }))}
        onChange={(mould) => patch({ mould })}
      />
      <SliderField
        label="Mixing of the liquid ahead of the front"
        value={sim.mixing}
        min={0}
        max={1}
        step={0.05}
        hint={`${describeMixing(sim.mixing)} — 0 stagnant, 1 fully mixed (effective partition coefficient, Burton–Prim–Slichter form).`}
        onChange={(mixing) => patch({ mixing })}
      />
      <ChoiceField<IngotElement>
        legend="Element to map"
        value={sim.element}
        choices={INGOT_ELEMENTS.map((el) => ({ value: el, label: el }))}
        onChange={(element) => patch({ element })}
      />
    </>
  );
}
