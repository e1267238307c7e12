/** Thrown anywhere in naming when the structure is outside what the engine names correctly. */
export class NamingRefusal extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = 'NamingRefusal';
  }
}
