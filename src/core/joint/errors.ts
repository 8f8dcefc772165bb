/**
 * A joint input that cannot be computed: an unknown thread or material, a missing
 * value, or values that contradict each other. `field` is the JointInput key at fault,
 * so the CLI can name its option and the workbench its field.
 */
export class JointInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'JointInputError';
  }
}
