/**
 * A deck's title as shown: "(parametric)" is added for a parametric deck
 * unless the title already says so (the demo deck's title does).
 */
export function deckTitleText(title: string, parametric: boolean): string {
  return parametric && !/parametric/i.test(title) ? `${title} (parametric)` : title;
}
