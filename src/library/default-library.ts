/** The library built from every record in dsl/. */
import { PRIMITIVES } from '../../dsl/index.ts';
import { Library } from './library.ts';

export const defaultLibrary = new Library(PRIMITIVES);
