import type { Translator } from '../text/translator.ts';

/**
 * What a block shown both on the community page and on its printed handout is told: the
 * reader's translator, the level of the block's own heading, and whether to give the handout's
 * shorter form (without the technical lines and introductions).
 */
export interface SheetBlockProps {
  readonly tr: Translator;
  readonly headingLevel: 2 | 3;
  readonly compact?: boolean;
}
