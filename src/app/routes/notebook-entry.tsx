/** /notebook/:entryId: the entry page (features/notebook) with the instructor's review form (features/notebook-review). */
import { useParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { PageBody } from "@/components/ui/page-header";
import { EntryPage } from "@/features/notebook/entry-page";
import { ReviewPanel } from "@/features/notebook-review/review-panel";

export function Component() {
  const id = Number(useParams().entryId);
  if (!Number.isInteger(id) || id <= 0) {
    return (
      <PageBody>
        <title>Not found — Grain &amp; Edge</title>
        <Alert tone="danger" title="This notebook entry was not found" />
      </PageBody>
    );
  }
  return <EntryPage key={id} id={id} renderReview={(entry) => <ReviewPanel entry={entry} />} />;
}
