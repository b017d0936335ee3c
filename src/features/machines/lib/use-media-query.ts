export { useMediaQuery } from '../../../lib/use-media-query';

/** The fleet shows a table from 1024 px up (the side navigation takes 224 px), cards below. */
export const WIDE_LAYOUT_QUERY = '(min-width: 1024px)';
