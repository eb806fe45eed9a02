/**
 * Thrown inside a rule when a request cannot be evaluated without guessing.
 * evaluate() turns it into { error }; nothing else should escape to a caller.
 */
export class RuleRefusal extends Error {
  constructor(message: string) {
    super(message)
    this.name = 'RuleRefusal'
  }
}

export function refuse(message: string): never {
  throw new RuleRefusal(message)
}
