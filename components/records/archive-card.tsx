import { Card } from "@/components/ui/card";
import { recordNoun, type RecordKind } from "@/lib/records/kinds";
import { RecordActions } from "./record-actions";

/** The foot of a record's own page (issue 16): what archiving does, or how to bring it back, and the buttons. */
export function ArchiveCard({
  kind,
  id,
  name,
  archived,
  text,
  afterDelete,
}: {
  kind: RecordKind;
  id: string;
  name: string;
  archived: boolean;
  text: { active: string; archived: string };
  afterDelete: string;
}) {
  return (
    <Card title={archived ? `Archived ${recordNoun(kind)}` : `Archive this ${recordNoun(kind)}`}>
      <p className="mb-2 text-ink-soft">{archived ? text.archived : text.active}</p>
      <RecordActions kind={kind} id={id} name={name} archived={archived} afterDelete={afterDelete} />
    </Card>
  );
}

/** The note at the top of an archived record's page. */
export function ArchivedNote({ children }: { children: React.ReactNode }) {
  return (
    <p role="note" className="mt-2 rounded-lg border-2 border-ink/40 bg-paper-deep p-3 font-semibold">
      {children}
    </p>
  );
}
