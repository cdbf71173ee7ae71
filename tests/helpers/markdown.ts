import GithubSlugger from 'github-slugger'

/** A link as written in a Markdown file: its target and the line it is on (1-based). */
export interface MarkdownLink {
  target: string
  line: number
}

const FENCE = /^\s*(```|~~~)/

/** The lines of a Markdown text with fenced code blocks blanked (their line numbers kept). */
function proseLines(text: string): string[] {
  let inFence = false
  return text.split('\n').map((line) => {
    if (FENCE.test(line)) {
      inFence = !inFence
      return ''
    }
    return inFence ? '' : line
  })
}

/** The text of a line without inline code spans, which GitHub does not read as links. */
function withoutCodeSpans(line: string): string {
  return line.replace(/(`+)[^`]*?\1/g, '')
}

/**
 * Every inline link and image target `[text](target)` outside code, except absolute URLs
 * (`http:`, `https:`, `mailto:`), which a test on this machine cannot follow.
 * @param text Markdown
 */
export function relativeLinks(text: string): MarkdownLink[] {
  const out: MarkdownLink[] = []
  proseLines(text).forEach((raw, i) => {
    const line = withoutCodeSpans(raw)
    for (const m of line.matchAll(/!?\[[^\]]*\]\(\s*<?([^)\s>]+)>?(?:\s+"[^"]*")?\s*\)/g)) {
      const target = m[1] ?? ''
      if (!/^(https?:|mailto:)/i.test(target)) out.push({ target, line: i + 1 })
    }
  })
  return out
}

/**
 * The anchors GitHub gives the headings of a Markdown text (github-slugger, the slugger GitHub's
 * own renderer follows: lower case, punctuation dropped, spaces to hyphens, repeats numbered).
 * @param text Markdown
 */
export function headingAnchors(text: string): Set<string> {
  const slugger = new GithubSlugger()
  const anchors = new Set<string>()
  for (const line of proseLines(text)) {
    const m = /^#{1,6}\s+(.+?)\s*#*\s*$/.exec(line)
    if (!m) continue
    // The rendered heading text: code spans keep their text, links keep their label.
    const heading = (m[1] ?? '').replace(/`([^`]*)`/g, '$1').replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
    anchors.add(slugger.slug(heading))
  }
  return anchors
}

/**
 * The folders a README's "## Architecture" section names: the first word of each line of its
 * first code block, when it ends in a slash ("src/", ".ci/").
 * @param readme Markdown of the README
 */
export function architectureFolders(readme: string): string[] {
  const start = readme.indexOf('\n## Architecture\n')
  if (start < 0) return []
  const rest = readme.slice(start + 1)
  const next = rest.indexOf('\n## ')
  const section = next < 0 ? rest : rest.slice(0, next)
  const block = /```[^\n]*\n([\s\S]*?)```/.exec(section)?.[1] ?? ''
  return block
    .split('\n')
    .map((line) => /^(\.?[\w-]+)\/(\s|$)/.exec(line)?.[1])
    .filter((name): name is string => !!name)
}
