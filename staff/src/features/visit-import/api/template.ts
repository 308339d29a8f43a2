/** The column header and one example row; a plain link so the browser saves it as a file. */
export const importTemplateHref = "/api/visit-imports/template.csv";
