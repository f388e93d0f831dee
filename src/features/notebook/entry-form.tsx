/**
 * The notebook entry form: react-hook-form with zodResolver over the SAME schema the server
 * validates with (shared/api/notebook.ts), so mistakes are explained before sending and the
 * server's field errors land on the same fields. Beside it, a live estimate from the science
 * core (the function the server uses) and the safety cautions.
 */
import { useEffect, useMemo, useRef } from "react";
import { useFieldArray, useForm, useWatch, type FieldErrors, type Path } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useNavigate } from "react-router";
import {
  COLD_TREATMENT_LABELS,
  COLD_TREATMENTS,
  NOTEBOOK_LIMITS as L,
  notebookEntryInputSchema,
  QUENCH_MEDIA,
  QUENCH_MEDIUM_LABELS,
  type NotebookEntryInput,
  type NotebookSteel,
} from "@shared/api/notebook";
import { computeNotebookEntry, type NotebookComputation } from "@shared/api/notebook-compute";
import { useSavedAlloys } from "@/api/alloys";
import { isApiError } from "@/api/client";
import { useSaveEntry } from "@/api/notebook";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { paths } from "@/config/paths";
import { messageFor } from "@/api/errors";
import { ComputedPanel } from "./computed-panel";
import { NumberField, SelectField, TextAreaField } from "./form-controls";
import { SafetyCautions } from "./safety-cautions";
import { alloyOptions, findSteel, formatComposition, gradeOptions } from "./steel";

export type EntryFormDefaults = Partial<Omit<NotebookEntryInput, "quenchMedium" | "coldTreatment">> & {
  quenchMedium?: NotebookEntryInput["quenchMedium"] | "";
  coldTreatment?: NotebookEntryInput["coldTreatment"];
};

/** Where each field lives in the page, for the error summary's links. */
const fieldId = (name: string) => `nb-${name.replace(/\./g, "-")}`;

const FIELD_LABELS: Record<string, string> = {
  title: "Title",
  workedOn: "Date",
  steel: "Steel",
  normalizingCycles: "Normalising cycles",
  austenitizeC: "Austenitising temperature",
  soakMinutes: "Soak time",
  quenchMedium: "Quench medium",
  coldTreatment: "Cold treatment",
  temperCycles: "Tempering cycles",
  temperC: "Tempering temperature",
  temperHours: "Time per cycle",
  hardness: "Hardness readings",
  notes: "Notes",
};

function flattenErrors(errors: FieldErrors<NotebookEntryInput>): { name: string; label: string; message: string }[] {
  const out: { name: string; label: string; message: string }[] = [];
  for (const [name, error] of Object.entries(errors)) {
    if (!error) continue;
    if (name === "hardness" && Array.isArray(error)) {
      error.forEach((row, i) => {
        for (const key of ["hrc", "spot"] as const) {
          const m = (row as Record<string, { message?: string }> | undefined)?.[key]?.message;
          if (m) out.push({ name: `hardness.${i}.${key}`, label: `Reading ${i + 1}${key === "spot" ? ", spot" : ""}`, message: m });
        }
      });
      continue;
    }
    const message = (error as { message?: string; root?: { message?: string } }).message ?? (error as { root?: { message?: string } }).root?.message;
    if (message) out.push({ name, label: FIELD_LABELS[name] ?? name, message });
  }
  return out;
}

/** The live estimate, when the inputs it needs are valid numbers. */
function preview(values: Partial<NotebookEntryInput>, composition: Record<string, number> | undefined): NotebookComputation | null {
  if (!composition) return null;
  const num = (v: unknown) => (typeof v === "number" && Number.isFinite(v) ? v : null);
  const austenitizeC = num(values.austenitizeC);
  if (austenitizeC === null || austenitizeC < L.austenitizeC.min || austenitizeC > L.austenitizeC.max) return null;
  const temperCycles = num(values.temperCycles) ?? 0;
  const temperC = num(values.temperC);
  const temperHours = num(values.temperHours);
  const temperOk = temperC !== null && temperHours !== null && temperC >= L.temperC.min && temperC <= L.temperC.max && temperHours >= L.temperHours.min && temperHours <= L.temperHours.max;
  const hardness = (values.hardness ?? []).filter((r) => r && num(r.hrc) !== null && r.hrc >= L.hrc.min && r.hrc <= L.hrc.max).map((r) => ({ hrc: r.hrc, spot: r.spot ?? "" }));
  try {
    return computeNotebookEntry({
      composition,
      austenitizeC,
      coldTreatment: values.coldTreatment && COLD_TREATMENTS.includes(values.coldTreatment) ? values.coldTreatment : "none",
      temperCycles: temperOk && Number.isInteger(temperCycles) && temperCycles > 0 ? temperCycles : 0,
      temperC: temperOk ? temperC : null,
      temperHours: temperOk ? temperHours : null,
      hardness,
    });
  } catch {
    return null;
  }
}

const nullableNumber = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));

export function EntryForm({ entryId, defaults, currentSteel }: { entryId?: number; defaults: EntryFormDefaults; currentSteel?: NotebookSteel }) {
  const navigate = useNavigate();
  const save = useSaveEntry(entryId);
  const alloys = useSavedAlloys();
  const summaryRef = useRef<HTMLDivElement>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, submitCount },
  } = useForm<NotebookEntryInput>({
    resolver: zodResolver(notebookEntryInputSchema),
    defaultValues: defaults as NotebookEntryInput,
    mode: "onTouched",
  });
  const readings = useFieldArray({ control, name: "hardness" });
  const values = useWatch({ control }) as Partial<NotebookEntryInput>;

  const savedAlloys = alloys.data ?? [];
  const selected = findSteel(values.steel ?? "", savedAlloys);
  // An entry whose saved alloy was deleted keeps its copied composition.
  const composition = selected?.composition ?? (currentSteel && values.steel === currentSteel.key ? currentSteel.composition : undefined);
  const estimate = useMemo(() => preview(values, composition as Record<string, number> | undefined), [values, composition]);
  const problems = flattenErrors(errors);

  useEffect(() => {
    if (submitCount > 0 && problems.length > 0) summaryRef.current?.focus();
    // Only when a submit fails, not on every keystroke.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [submitCount]);

  const onSubmit = handleSubmit(async (input) => {
    try {
      const { entry } = await save.mutateAsync(input);
      navigate(paths.notebookEntry(entry.id));
    } catch (error) {
      if (isApiError(error) && error.fields) {
        for (const [name, messages] of Object.entries(error.fields)) {
          if (messages[0]) setError(name as Path<NotebookEntryInput>, { type: "server", message: messages[0] });
        }
      }
      summaryRef.current?.focus();
    }
  });

  const temperNeeded = (values.temperCycles ?? 0) > 0;
  const showSummary = (submitCount > 0 && problems.length > 0) || save.isError;

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem] lg:items-start">
      <form onSubmit={onSubmit} noValidate className="space-y-8" aria-describedby={showSummary ? "nb-form-errors" : undefined}>
        {showSummary ? (
          <div ref={summaryRef} tabIndex={-1} id="nb-form-errors" className="outline-none">
            <Alert tone="danger" title={problems.length > 0 ? `Check ${problems.length === 1 ? "this field" : `these ${problems.length} fields`}` : "The entry was not saved"}>
              {problems.length > 0 ? (
                <ul className="mt-1 list-disc space-y-1 pl-5">
                  {problems.map((p) => (
                    <li key={p.name}>
                      <a href={`#${fieldId(p.name)}`} className="font-semibold underline underline-offset-2">
                        {p.label}
                      </a>
                      : {p.message}
                    </li>
                  ))}
                </ul>
              ) : (
                <p>{messageFor(save.error)}</p>
              )}
            </Alert>
          </div>
        ) : null}

        <fieldset className="space-y-5 rounded-lg border border-bone-300 bg-white p-5 shadow-card md:p-6">
          <legend className="float-left mb-1 w-full font-display text-xl font-semibold text-soot-900">The piece</legend>
          <TextField id={fieldId("title")} label="Title" hint="What the piece is, e.g. “Paring knife” or “Test coupon 3”." maxLength={L.titleMax} error={errors.title?.message} {...register("title")} />
          <div className="grid gap-5 sm:grid-cols-2">
            <TextField id={fieldId("workedOn")} label="Date worked" type="date" error={errors.workedOn?.message} {...register("workedOn")} />
            <SelectField
              id={fieldId("steel")}
              label="Steel"
              error={errors.steel?.message}
              hint={selected ? formatComposition(selected.composition) : currentSteel && values.steel === currentSteel.key ? `${currentSteel.label}: ${formatComposition(currentSteel.composition)}` : "A standard grade, or a composition you saved in the alloy explorer."}
              {...register("steel")}
            >
              <option value="">Choose a steel…</option>
              <optgroup label="Standard grades">
                {gradeOptions().map((o) => (
                  <option key={o.key} value={o.key}>
                    {o.label}
                  </option>
                ))}
              </optgroup>
              {savedAlloys.length > 0 || (currentSteel?.source === "alloy" && !selected) ? (
                <optgroup label="Your saved alloys">
                  {alloyOptions(savedAlloys).map((o) => (
                    <option key={o.key} value={o.key}>
                      {o.label}
                    </option>
                  ))}
                  {currentSteel?.source === "alloy" && !savedAlloys.some((a) => `alloy:${a.id}` === currentSteel.key) ? (
                    <option value={currentSteel.key}>{currentSteel.label} (deleted; composition kept)</option>
                  ) : null}
                </optgroup>
              ) : null}
            </SelectField>
          </div>
        </fieldset>

        <fieldset className="space-y-5 rounded-lg border border-bone-300 bg-white p-5 shadow-card md:p-6">
          <legend className="float-left mb-1 w-full font-display text-xl font-semibold text-soot-900">Heat treatment</legend>
          <p className="text-sm text-soot-700">
            Record what you did, in order. Take temperatures and times from your steel maker&rsquo;s data sheet, and read the{" "}
            <a href="#safety" className="font-semibold text-quench-700 underline underline-offset-2">
              safety cautions
            </a>{" "}
            before quenching.
          </p>
          <div className="grid gap-5 sm:grid-cols-3">
            <NumberField id={fieldId("normalizingCycles")} label="Normalising cycles" min={0} max={L.normalizingCyclesMax} step={1} error={errors.normalizingCycles?.message} {...register("normalizingCycles", { valueAsNumber: true })} />
            <NumberField id={fieldId("austenitizeC")} label="Austenitising temperature" unit="°C" min={L.austenitizeC.min} max={L.austenitizeC.max} step={5} error={errors.austenitizeC?.message} {...register("austenitizeC", { valueAsNumber: true })} />
            <NumberField id={fieldId("soakMinutes")} label="Soak time" unit="min" min={L.soakMinutes.min} max={L.soakMinutes.max} step={1} error={errors.soakMinutes?.message} {...register("soakMinutes", { valueAsNumber: true })} />
          </div>
          <div className="grid gap-5 sm:grid-cols-2">
            <SelectField id={fieldId("quenchMedium")} label="Quench medium" error={errors.quenchMedium?.message} {...register("quenchMedium")}>
              <option value="">Choose…</option>
              {QUENCH_MEDIA.map((m) => (
                <option key={m} value={m}>
                  {QUENCH_MEDIUM_LABELS[m]}
                </option>
              ))}
            </SelectField>
            <SelectField id={fieldId("coldTreatment")} label="Cold treatment after the quench" error={errors.coldTreatment?.message} {...register("coldTreatment")}>
              {COLD_TREATMENTS.map((c) => (
                <option key={c} value={c}>
                  {COLD_TREATMENT_LABELS[c]}
                </option>
              ))}
            </SelectField>
          </div>
          <div className="grid gap-5 sm:grid-cols-3">
            <NumberField id={fieldId("temperCycles")} label="Tempering cycles" hint="0 if not tempered yet." min={0} max={L.temperCyclesMax} step={1} error={errors.temperCycles?.message} {...register("temperCycles", { valueAsNumber: true })} />
            <NumberField
              id={fieldId("temperC")}
              label="Tempering temperature"
              unit="°C"
              min={L.temperC.min}
              max={L.temperC.max}
              step={5}
              hint={temperNeeded ? undefined : "Not needed with 0 cycles."}
              error={errors.temperC?.message}
              {...register("temperC", { setValueAs: nullableNumber })}
            />
            <NumberField
              id={fieldId("temperHours")}
              label="Time per cycle"
              unit="hours"
              min={L.temperHours.min}
              max={L.temperHours.max}
              step={0.25}
              hint={temperNeeded ? undefined : "Not needed with 0 cycles."}
              error={errors.temperHours?.message}
              {...register("temperHours", { setValueAs: nullableNumber })}
            />
          </div>
        </fieldset>

        <fieldset className="space-y-4 rounded-lg border border-bone-300 bg-white p-5 shadow-card md:p-6">
          <legend className="float-left mb-1 w-full font-display text-xl font-semibold text-soot-900">Hardness readings</legend>
          <p className="text-sm text-soot-700">
            Rockwell C, one row per indentation; several per piece, spaced apart and away from the edges. Say where each was taken if it helps.
          </p>
          {readings.fields.length === 0 ? <p className="rounded-md bg-bone-100 px-3 py-2 text-sm text-soot-700">No readings yet. Add them after testing.</p> : null}
          <ol className="space-y-3">
            {readings.fields.map((field, i) => (
              <li key={field.id} className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-3 gap-y-2 sm:grid-cols-[9rem_minmax(0,1fr)_auto]">
                <NumberField
                  id={fieldId(`hardness.${i}.hrc`)}
                  label={`Reading ${i + 1}`}
                  unit="HRC"
                  className="col-span-2 sm:col-span-1"
                  min={L.hrc.min}
                  max={L.hrc.max}
                  step={0.5}
                  error={errors.hardness?.[i]?.hrc?.message}
                  {...register(`hardness.${i}.hrc`, { valueAsNumber: true })}
                />
                <TextField
                  id={fieldId(`hardness.${i}.spot`)}
                  label={`Where (reading ${i + 1})`}
                  placeholder="edge, spine, 20 mm from tip…"
                  maxLength={L.spotMax}
                  className="col-span-2 sm:col-span-1"
                  error={errors.hardness?.[i]?.spot?.message}
                  {...register(`hardness.${i}.spot`)}
                />
                <Button variant="ghost" className="col-span-2 justify-self-start sm:col-span-1 sm:mt-7" onClick={() => readings.remove(i)} aria-label={`Remove reading ${i + 1}`}>
                  Remove
                </Button>
              </li>
            ))}
          </ol>
          {errors.hardness?.message || errors.hardness?.root?.message ? <p className="text-sm font-medium text-danger-700">{errors.hardness?.message ?? errors.hardness?.root?.message}</p> : null}
          <Button variant="secondary" onClick={() => readings.append({ hrc: Number.NaN, spot: "" }, { shouldFocus: true })} disabled={readings.fields.length >= L.readingsMax}>
            Add a reading
          </Button>
        </fieldset>

        <fieldset className="space-y-4 rounded-lg border border-bone-300 bg-white p-5 shadow-card md:p-6">
          <legend className="float-left mb-1 w-full font-display text-xl font-semibold text-soot-900">Notes</legend>
          <TextAreaField
            id={fieldId("notes")}
            label="What you saw and would change"
            hint="Scale, warping, the fracture grain, how the edge behaved, what you would do differently."
            maxLength={L.notesMax}
            error={errors.notes?.message}
            {...register("notes")}
          />
        </fieldset>

        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" size="lg" disabled={isSubmitting}>
            {isSubmitting ? "Saving…" : entryId === undefined ? "Save entry" : "Save changes"}
          </Button>
          <ButtonLink variant="secondary" size="lg" to={entryId === undefined ? paths.notebook : paths.notebookEntry(entryId)}>
            Cancel
          </ButtonLink>
          {entryId === undefined ? <p className="text-sm text-soot-600">You can add photos and reports once the entry is saved.</p> : null}
        </div>
      </form>

      <div className="space-y-6">
        {estimate ? (
          <ComputedPanel computation={estimate} coldTreatment={values.coldTreatment} headingId="preview-heading" preview />
        ) : (
          <section aria-labelledby="preview-heading" className="rounded-lg border border-quench-300 bg-quench-100/40 p-5">
            <p className="eyebrow text-quench-700">Live estimate</p>
            <h2 id="preview-heading" className="mt-1 text-xl font-semibold text-soot-900">
              What the models say
            </h2>
            <p className="mt-2 text-sm text-soot-700">Choose a steel and an austenitising temperature to see the estimates here as you type.</p>
          </section>
        )}
        <SafetyCautions />
      </div>
    </div>
  );
}

/** A form's starting values for a new entry. */
export function newEntryDefaults(today: string): EntryFormDefaults {
  return {
    title: "",
    workedOn: today,
    steel: "",
    normalizingCycles: 0,
    soakMinutes: 10,
    quenchMedium: "",
    coldTreatment: "none",
    temperCycles: 2,
    temperHours: 1,
    hardness: [],
    notes: "",
  };
}
