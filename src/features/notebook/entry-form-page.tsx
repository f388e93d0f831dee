/** /notebook/new and /notebook/:entryId/edit: the entry form in the notebook's page frame. */
import { useParams } from "react-router";
import type { NotebookEntry } from "@shared/api/notebook";
import { useNotebookEntry } from "@/api/notebook";
import { Alert } from "@/components/ui/alert";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { EntryForm, newEntryDefaults, type EntryFormDefaults } from "./entry-form";
import { todayIso } from "./format";
import { Loaded } from "@/components/ui/loaded";

function defaultsFrom(entry: NotebookEntry): EntryFormDefaults {
  return {
    title: entry.title,
    workedOn: entry.workedOn,
    steel: entry.steel.key,
    ...entry.process,
    hardness: entry.hardness.map((r) => ({ hrc: r.hrc, spot: r.spot })),
    notes: entry.notes,
  };
}

function EditEntry({ id }: { id: number }) {
  const query = useNotebookEntry(id);
  return (
    <Loaded query={query} label="notebook entry">
      {({ entry }) =>
        entry.canEdit ? (
          <EntryForm entryId={entry.id} defaults={defaultsFrom(entry)} currentSteel={entry.steel} />
        ) : (
          <Alert tone="info" title="Only the author can edit this entry">
            You can read it and, as their instructor, review it.
          </Alert>
        )
      }
    </Loaded>
  );
}

export function Component() {
  const { entryId } = useParams();
  const id = entryId === undefined ? undefined : Number(entryId);
  const editing = id !== undefined;
  return (
    <>
      <title>{editing ? "Edit notebook entry — Grain & Edge" : "New notebook entry — Grain & Edge"}</title>
      <PageHeader
        eyebrow="Forge notebook"
        title={editing ? "Edit the entry" : "A new entry"}
        lede="One blade or test coupon: its steel, what you did to it, and what the hardness tester said."
      />
      <PageBody>
        {editing ? (
          Number.isInteger(id) && id! > 0 ? (
            <EditEntry id={id!} />
          ) : (
            <Alert tone="danger" title="This notebook entry was not found" />
          )
        ) : (
          <EntryForm defaults={newEntryDefaults(todayIso())} />
        )}
      </PageBody>
    </>
  );
}
