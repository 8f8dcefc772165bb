/**
 * A joint input that cannot be computed: an unknown thread or material, a missing
 * value, or values that contradict each other. `field` is the JointInput key at fault,
 * so the CLI can name its option and the workbench its field.
 */
export class JointInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
    /** The same message with its numbers in US units (in, ksi), when it carries any. */
    readonly usMessage?: string,
  ) {
    super(message);
    this.name = 'JointInputError';
  }

  /** The message in a unit system: `message` is SI; US falls back to it when no US wording exists. */
  messageIn(units: 'si' | 'us'): string {
    return units === 'us' && this.usMessage !== undefined ? this.usMessage : this.message;
  }
}
