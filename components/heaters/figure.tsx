/** One labelled figure of the planner's panels; `data-figure` is what the browser tests read. */
export function Figure({ id, label, value }: { id: string; label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-faint">{label}</dt>
      <dd className="text-lg font-bold" data-figure={id}>
        {value}
      </dd>
    </div>
  );
}
