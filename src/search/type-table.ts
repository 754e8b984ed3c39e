/**
 * Integer ids for the types the search meets, so its inner loops index arrays instead of
 * looking strings up in maps. Ids are given in order of first sight, so they are the same for
 * the same library and constants.
 */
import { splitFunctionType, type Type } from '../language/types.ts';

export class TypeTable {
  private readonly ids = new Map<Type, number>();
  private readonly types: Type[] = [];
  /** For each id: true when the type is a function type (a section). */
  readonly isFunction: boolean[] = [];

  id(type: Type): number {
    let id = this.ids.get(type);
    if (id === undefined) {
      id = this.types.length;
      this.ids.set(type, id);
      this.types.push(type);
      this.isFunction.push(splitFunctionType(type) !== undefined);
    }
    return id;
  }

  /** The id of a type already seen, or -1. */
  find(type: Type): number {
    return this.ids.get(type) ?? -1;
  }

  type(id: number): Type {
    return this.types[id]!;
  }

  get size(): number {
    return this.types.length;
  }
}
