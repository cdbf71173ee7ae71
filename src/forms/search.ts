/** Whether what a person typed into a search box occurs in any of the texts, in any case. */
export function matchesSearch(typed: string, texts: readonly (string | null | undefined)[]) {
  const needle = typed.trim().toLowerCase()
  return !needle || texts.join(' ').toLowerCase().includes(needle)
}
