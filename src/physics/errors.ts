/**
 * Raised by the physics core for input outside what a model or table covers:
 * an unknown code, a dopant the material does not list, a target no doping
 * can reach. The message says what was wrong and what is allowed.
 */
export class PhysicsDomainError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PhysicsDomainError';
  }
}
