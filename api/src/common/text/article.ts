/** "a chassis", "an oil pan", "an engine controller": the indefinite article by the noun's first letter. */
export function withArticle(noun: string, capitalized = false): string {
  const article = /^[aeiou]/i.test(noun) ? 'an' : 'a';
  return `${capitalized ? article[0].toUpperCase() + article.slice(1) : article} ${noun}`;
}
