/** The shape every rule file exports: its stable id and a one-line summary (the file's doc comment is its documentation). */
export interface RuleDefinition {
  /** stable id, `namespace/name`: added, never renamed (DESIGN.md, "Contracts") */
  id: string;
  /** one lower-case line, shown beside the id in SARIF and on the site's checks page */
  summary: string;
}
