// Stack colours from the app's ink and signal families, alternating dark and light so that
// neighbouring bands stay apart; the legend and the table name every band in words.
export const USAGE_FILLS = ['#20494d', '#f7a560', '#4f8c8f', '#933f14', '#abcdce', '#602d15'] as const;
