// Stands in for @inquirer/external-editor inside the CLI bundle. inquirer 12 registers every
// built-in prompt, the text-editor one among them, which brings this package and its character
// set tables (iconv-lite, chardet): more than half the questionnaire's code. shaftwise never asks
// a question of type 'editor' (src/cli/ask/prompts.ts uses input, select and confirm); should
// anything open the editor, the failure is loud rather than silent.
export function editAsync() {
  throw new Error('@inquirer/external-editor is not bundled: shaftwise asks no editor questions');
}
