import { buttonClass } from "@/components/ui/button";

/** The organiser's search box: a plain GET form to /search, so it works before any script arrives. */
export function SearchBox({ value = "", id = "site-search", name = "Search the group" }: { value?: string; id?: string; name?: string }) {
  return (
    <form role="search" aria-label={name} action="/search" method="get" className="flex w-full min-w-0 items-center gap-2 sm:w-auto">
      <label htmlFor={id} className="sr-only">
        Search the group&rsquo;s records
      </label>
      <input
        id={id}
        name="q"
        type="search"
        defaultValue={value}
        placeholder="Search…"
        minLength={2}
        maxLength={100}
        className="min-h-11 w-full min-w-0 rounded-lg border-2 border-ink/40 bg-white px-3 py-2 text-ink sm:w-56"
      />
      <button type="submit" className={buttonClass("secondary", "shrink-0")}>
        Search
      </button>
    </form>
  );
}
