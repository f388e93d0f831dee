import { useId, useState, type FormEvent } from "react";
import { Link, useLocation, useNavigate } from "react-router";
import type { AlloyComposition, SavedAlloy } from "@shared/api/alloys";
import { ALLOY_NAME_MAX, type CustomAlloySpec } from "@shared/sim/alloy/params";
import { compositionText } from "@shared/sim/alloy/format";
import { useMe } from "@/api/auth";
import { useAttachAlloy, useDeleteAlloy, useRenameAlloy, useSaveAlloy, useSavedAlloys } from "@/api/alloys";
import { isApiError } from "@/api/client";
import { useModules } from "@/api/lessons";
import { paths, signInPath } from "@/config/paths";

interface SavedAlloysProps {
  /** The alloy being edited: what "Save" stores. */
  current: { name: string; composition: AlloyComposition };
  /** Put a saved alloy into the comparison (replacing the selected slot). */
  onOpen: (spec: CustomAlloySpec) => void;
}

const inputClass = "block min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-2 text-sm";
const buttonClass = "inline-flex min-h-10 items-center rounded-sm border border-soot-500/60 bg-white px-3 text-sm font-semibold text-soot-900 hover:border-soot-900 disabled:opacity-50";

function errorText(error: unknown): string {
  if (isApiError(error)) {
    const fields = error.fields ? Object.values(error.fields).flat().join(" ") : "";
    return [error.message, fields].filter(Boolean).join(" ");
  }
  return "Something went wrong. Try again.";
}

/** Saved alloys of the signed-in user: save the current alloy, open, rename, delete; instructors attach to a lesson. */
export function SavedAlloys({ current, onOpen }: SavedAlloysProps) {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();
  const user = me.data ?? null;
  const saved = useSavedAlloys(user !== null);
  const save = useSaveAlloy();
  const nameId = useId();
  const [name, setName] = useState("");
  const [message, setMessage] = useState<string | null>(null);

  if (me.isPending) return null;
  if (!user) {
    return (
      <section aria-labelledby="saved-alloys" className="rounded-md border border-bone-300 bg-white p-3 text-sm">
        <h3 id="saved-alloys" className="font-semibold text-soot-900">
          Saved alloys
        </h3>
        <p className="mt-1 text-soot-700">
          <Link
            className="font-semibold text-quench-700 underline underline-offset-4"
            to={signInPath(location.pathname + location.search)}
            onClick={(e) => {
              // The explorer rewrites the address bar without the router: come back to the current comparison.
              e.preventDefault();
              navigate(signInPath(window.location.pathname + window.location.search));
            }}
          >
            Sign in
          </Link>{" "}
          to keep named alloys and open them later. The link in the address bar already holds this comparison.
        </p>
      </section>
    );
  }

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const chosen = (name.trim() || current.name).slice(0, ALLOY_NAME_MAX);
    setMessage(null);
    save.mutate(
      { name: chosen, composition: current.composition },
      {
        onSuccess: ({ alloy }) => {
          setMessage(`Saved “${alloy.name}”.`);
          setName("");
        },
      },
    );
  };

  return (
    <section aria-labelledby="saved-alloys" className="space-y-3 rounded-md border border-bone-300 bg-white p-3 text-sm">
      <h3 id="saved-alloys" className="font-semibold text-soot-900">
        Saved alloys
      </h3>
      <form onSubmit={submit} className="space-y-2" aria-label="Save the selected alloy">
        <label htmlFor={nameId} className="block font-semibold text-soot-800">
          Save the selected alloy as
        </label>
        <div className="flex gap-2">
          <input id={nameId} className={inputClass} maxLength={ALLOY_NAME_MAX} placeholder={current.name} value={name} onChange={(e) => setName(e.target.value)} />
          <button type="submit" className={buttonClass} disabled={save.isPending}>
            {save.isPending ? "Saving…" : "Save"}
          </button>
        </div>
        <p role="status" className="min-h-5 text-xs text-success-700">
          {message}
        </p>
        {save.isError ? (
          <p role="alert" className="text-xs text-danger-700">
            {errorText(save.error)}
          </p>
        ) : null}
      </form>
      {saved.isPending ? <p className="text-soot-600">Loading your alloys…</p> : null}
      {saved.isError ? <p role="alert" className="text-danger-700">{errorText(saved.error)}</p> : null}
      {saved.data && saved.data.length === 0 ? <p className="text-soot-600">Nothing saved yet.</p> : null}
      {saved.data && saved.data.length > 0 ? (
        <ul className="divide-y divide-bone-200" aria-label="Your saved alloys">
          {saved.data.map((alloy) => (
            <SavedAlloyRow key={alloy.id} alloy={alloy} canAttach={user.role !== "student"} onOpen={onOpen} />
          ))}
        </ul>
      ) : null}
    </section>
  );
}

function SavedAlloyRow({ alloy, canAttach, onOpen }: { alloy: SavedAlloy; canAttach: boolean; onOpen: (spec: CustomAlloySpec) => void }) {
  const rename = useRenameAlloy();
  const remove = useDeleteAlloy();
  const [mode, setMode] = useState<"view" | "rename" | "attach" | "confirm-delete">("view");
  const [draft, setDraft] = useState(alloy.name);
  const renameId = useId();
  const error = rename.error ?? remove.error;
  return (
    <li className="py-2">
      <p className="font-semibold text-soot-900">{alloy.name}</p>
      <p className="text-xs text-soot-600">{compositionText(alloy.composition)}</p>
      {mode === "rename" ? (
        <form
          className="mt-1.5 flex gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            rename.mutate({ id: alloy.id, name: draft }, { onSuccess: () => setMode("view") });
          }}
        >
          <label htmlFor={renameId} className="sr-only">
            New name for {alloy.name}
          </label>
          <input id={renameId} className={inputClass} maxLength={ALLOY_NAME_MAX} value={draft} onChange={(e) => setDraft(e.target.value)} />
          <button type="submit" className={buttonClass} disabled={rename.isPending}>
            Rename
          </button>
          <button type="button" className={buttonClass} onClick={() => setMode("view")}>
            Cancel
          </button>
        </form>
      ) : null}
      {mode === "attach" ? <AttachForm alloy={alloy} onDone={() => setMode("view")} /> : null}
      {mode === "view" || mode === "confirm-delete" ? (
        <div className="mt-1.5 flex flex-wrap gap-2">
          <button type="button" className={buttonClass} onClick={() => onOpen({ name: alloy.name, ...alloy.composition })}>
            Open<span className="sr-only"> {alloy.name}</span>
          </button>
          <button type="button" className={buttonClass} onClick={() => setMode("rename")}>
            Rename<span className="sr-only"> {alloy.name}</span>
          </button>
          {canAttach ? (
            <button type="button" className={buttonClass} onClick={() => setMode("attach")}>
              Attach to a lesson<span className="sr-only">: {alloy.name}</span>
            </button>
          ) : null}
          {mode === "confirm-delete" ? (
            <button type="button" className={`${buttonClass} border-danger-700 text-danger-700`} onClick={() => remove.mutate(alloy.id)} disabled={remove.isPending}>
              Really delete {alloy.name}?
            </button>
          ) : (
            <button type="button" className={buttonClass} onClick={() => setMode("confirm-delete")}>
              Delete<span className="sr-only"> {alloy.name}</span>
            </button>
          )}
        </div>
      ) : null}
      {error ? (
        <p role="alert" className="mt-1 text-xs text-danger-700">
          {errorText(error)}
        </p>
      ) : null}
    </li>
  );
}

/** Instructor: attach a saved alloy to a lesson task, with a note for the learners. */
function AttachForm({ alloy, onDone }: { alloy: SavedAlloy; onDone: () => void }) {
  const modules = useModules();
  const attach = useAttachAlloy();
  const lessonId = useId();
  const noteId = useId();
  const lessons =
    modules.data?.modules.flatMap((m) => m.lessons.map((l) => ({ slug: l.slug, title: `${m.title} — ${l.title}`, href: paths.lesson(m.slug, l.slug), name: l.title }))) ?? [];
  const [lessonSlug, setLessonSlug] = useState("");
  const [note, setNote] = useState("");
  const [done, setDone] = useState<{ name: string; href: string } | null>(null);
  const slug = lessonSlug || lessons[0]?.slug || "";
  return (
    <form
      className="mt-2 space-y-2 rounded-sm bg-bone-100 p-2"
      onSubmit={(e) => {
        e.preventDefault();
        attach.mutate({ id: alloy.id, lessonSlug: slug, note }, { onSuccess: ({ attachment }) => setDone(lessons.find((l) => l.slug === attachment.lessonSlug) ?? null) });
      }}
    >
      <div>
        <label htmlFor={lessonId} className="block text-xs font-semibold text-soot-800">
          Lesson
        </label>
        <select id={lessonId} className={inputClass} value={slug} onChange={(e) => setLessonSlug(e.target.value)} disabled={lessons.length === 0}>
          {lessons.map((l) => (
            <option key={l.slug} value={l.slug}>
              {l.title}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor={noteId} className="block text-xs font-semibold text-soot-800">
          Note for the task (optional)
        </label>
        <textarea id={noteId} className={inputClass} maxLength={500} rows={2} value={note} onChange={(e) => setNote(e.target.value)} />
      </div>
      <div className="flex gap-2">
        <button type="submit" className={buttonClass} disabled={attach.isPending || !slug}>
          Attach
        </button>
        <button type="button" className={buttonClass} onClick={onDone}>
          Close
        </button>
      </div>
      <p role="status" className="text-xs text-success-700">
        {done ? (
          <>
            Attached to{" "}
            <Link className="font-semibold underline underline-offset-2" to={done.href}>
              {done.name}
            </Link>
            .
          </>
        ) : null}
      </p>
      {attach.isError ? (
        <p role="alert" className="text-xs text-danger-700">
          {errorText(attach.error)}
        </p>
      ) : null}
    </form>
  );
}
