/**
 * Why one line cannot be evaluated. Thrown inside the engine and caught per
 * line, so one bad line never stops the others. `dependsOn` marks the
 * "depends on line n" case, whose wording already names a line.
 */
export class FormulaProblem extends Error {
  readonly dependsOn?: number;

  constructor(message: string, dependsOn?: number) {
    super(message);
    this.name = "FormulaProblem";
    this.dependsOn = dependsOn;
  }
}
