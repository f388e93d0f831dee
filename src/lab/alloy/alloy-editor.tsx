import { useEffect, useId, useState, type KeyboardEvent } from "react";
import { GRADE_PRESETS, findGrade } from "@shared/metallurgy/grades";
import { ELEMENT_RANGE_MASS_PCT } from "@shared/sim/alloy/element-ranges";
import { ALLOY_ELEMENTS, ALLOY_NAME_MAX, MAX_ALLOYS, isGradeSpec, resolveAlloy, toCustomSpec, type AlloyElement, type AlloySpec } from "@shared/sim/alloy/params";
import { SliderField } from "@/lab/shared-ui/slider-field";
import { SLOTS } from "./slots";

const ELEMENT_NAMES: Record<AlloyElement, string> = {
  C: "Carbon",
  Cr: "Chromium",
  V: "Vanadium",
  W: "Tungsten",
  Mo: "Molybdenum",
  Mn: "Manganese",
  Si: "Silicon",
  Ni: "Nickel",
  N: "Nitrogen",
};

interface AlloyEditorProps {
  alloys: readonly AlloySpec[];
  selected: number;
  onSelect: (index: number) => void;
  onChange: (index: number, spec: AlloySpec) => void;
  onAdd: () => void;
  onRemove: (index: number) => void;
}

/**
 * Tabs for the (up to three) alloys and the composition controls of the selected one. A slider move
 * turns a grade preset into an editable custom alloy of the same composition.
 */
export function AlloyEditor({ alloys, selected, onSelect, onChange, onAdd, onRemove }: AlloyEditorProps) {
  const baseId = useId();
  const spec = alloys[selected];
  const resolved = resolveAlloy(spec);
  const custom = isGradeSpec(spec) ? null : spec;

  const onTabKey = (e: KeyboardEvent<HTMLButtonElement>) => {
    const delta = e.key === "ArrowRight" ? 1 : e.key === "ArrowLeft" ? -1 : 0;
    if (!delta) return;
    e.preventDefault();
    const next = (selected + delta + alloys.length) % alloys.length;
    onSelect(next);
    document.getElementById(`${baseId}-tab-${next}`)?.focus();
  };

  const setElement = (el: AlloyElement, value: number) => {
    const base = custom ?? toCustomSpec(spec);
    const next = { ...base } as Record<string, unknown>;
    if (value > 0) next[el] = value;
    else delete next[el];
    onChange(selected, next as AlloySpec);
  };

  return (
    <div>
      <div role="tablist" aria-label="Alloys to compare" className="flex flex-wrap gap-1">
        {alloys.map((a, i) => {
          const active = i === selected;
          return (
            <button
              key={i}
              id={`${baseId}-tab-${i}`}
              type="button"
              role="tab"
              aria-selected={active}
              aria-controls={`${baseId}-panel`}
              tabIndex={active ? 0 : -1}
              onClick={() => onSelect(i)}
              onKeyDown={onTabKey}
              className={`flex min-h-10 max-w-[12rem] items-center gap-1.5 rounded-t-sm border border-b-0 px-3 text-sm ${
                active ? "border-soot-700 bg-white font-semibold text-soot-900" : "border-bone-300 bg-bone-100 text-soot-700 hover:text-soot-900"
              }`}
            >
              <span aria-hidden="true" style={{ color: SLOTS[i].colour }}>
                {SLOTS[i].symbol}
              </span>
              <span className="truncate">{resolveAlloy(a).name}</span>
            </button>
          );
        })}
        {alloys.length < MAX_ALLOYS ? (
          <button type="button" onClick={onAdd} className="min-h-10 rounded-t-sm border border-dashed border-soot-500/60 px-3 text-sm font-semibold text-quench-700 hover:bg-quench-100">
            + Add an alloy
          </button>
        ) : null}
      </div>
      <div id={`${baseId}-panel`} role="tabpanel" aria-labelledby={`${baseId}-tab-${selected}`} className="space-y-3 border-t border-soot-700 pt-3">
        <div className="grid gap-3 @sm:grid-cols-2">
          <div>
            <label htmlFor={`${baseId}-preset`} className="block text-sm font-semibold text-soot-800">
              Start from a standard grade
            </label>
            <select
              id={`${baseId}-preset`}
              value={isGradeSpec(spec) ? spec.grade : ""}
              onChange={(e) => e.target.value && onChange(selected, { grade: e.target.value })}
              className="mt-1.5 block min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-2 text-sm"
            >
              {custom ? <option value="">Custom: {custom.name}</option> : null}
              {GRADE_PRESETS.map((g) => (
                <option key={g.id} value={g.id}>
                  {g.label}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor={`${baseId}-name`} className="block text-sm font-semibold text-soot-800">
              Name
            </label>
            <NameInput
              id={`${baseId}-name`}
              name={custom ? custom.name : resolved.name}
              onCommit={(name) => onChange(selected, { ...(custom ?? toCustomSpec(spec)), name } as AlloySpec)}
            />
          </div>
        </div>
        <p className="text-xs text-soot-600">{isGradeSpec(spec) ? findGrade(spec.grade)?.description : "Your own composition. Iron is the balance."}</p>
        <fieldset className="grid gap-x-5 gap-y-3 @lg:grid-cols-2 @3xl:grid-cols-3">
          <legend className="sr-only">Composition of {resolved.name}, mass %</legend>
          {ALLOY_ELEMENTS.map((el) => (
            <SliderField
              key={el}
              label={`${ELEMENT_NAMES[el]} (${el})`}
              value={resolved.composition[el] ?? 0}
              min={ELEMENT_RANGE_MASS_PCT[el].min}
              max={ELEMENT_RANGE_MASS_PCT[el].max}
              step={ELEMENT_RANGE_MASS_PCT[el].step}
              unit="%"
              onChange={(v) => setElement(el, v)}
            />
          ))}
        </fieldset>
        {alloys.length > 1 ? (
          <button type="button" onClick={() => onRemove(selected)} className="text-sm font-semibold text-danger-700 underline underline-offset-4">
            Remove {resolved.name} from the comparison
          </button>
        ) : null}
      </div>
    </div>
  );
}

/** The alloy's name: typed freely, stored once it is not blank (a blank name is not a valid alloy). */
function NameInput({ id, name, onCommit }: { id: string; name: string; onCommit: (name: string) => void }) {
  const [draft, setDraft] = useState(name);
  useEffect(() => setDraft(name), [name]);
  return (
    <input
      id={id}
      type="text"
      maxLength={ALLOY_NAME_MAX}
      value={draft}
      onChange={(e) => {
        setDraft(e.target.value);
        const trimmed = e.target.value.trim();
        if (trimmed && trimmed !== name) onCommit(trimmed);
      }}
      onBlur={() => setDraft(name)}
      className="mt-1.5 block min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-2 text-sm"
    />
  );
}
