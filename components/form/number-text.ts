/** Text typed into a number field: decimal comma, spaces and the typographic minus accepted; '' = nothing given. */
export function parseNumberText(text: string): number | undefined {
  const cleaned = text.trim().replace(/\s+/g, '').replace(',', '.').replace('\u2212', '-');
  if (cleaned === '') return undefined;
  return Number(cleaned);
}

/** For zodResolver's parse options: a number field left empty or with letters in it says so in words. */
export function numberFieldErrors(issue: { code: string; expected?: unknown; input?: unknown }) {
  if (issue.code === 'invalid_type' && issue.expected === 'number') {
    return issue.input === undefined ? 'Fill this in (a number)' : 'Enter a number, such as 12 or 7.5';
  }
  return undefined;
}
