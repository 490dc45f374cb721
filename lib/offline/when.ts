/** When a copy kept on this device was fetched, as a person reads it: "2 Dec 2026, 15:40". */
export function fetchedWords(iso: string): string {
  return new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" }).format(new Date(iso));
}
