/**
 * Ok rows the terminal report lists unless asked for all: beyond this many they are counted on one
 * line, so a suite of a thousand metrics does not push its regressions a thousand lines up (the
 * markdown report folds them into a closed <details> for the same reason). Its own module, so the
 * CLI's help text can name it without loading the renderer.
 */
export const OK_ROWS_LISTED = 30;
