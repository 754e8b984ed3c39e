/** Object extraction: connected regions, by one colour or many, with 4 or 8 neighbours. */
import { backgroundColour, components } from '../src/grid/components.ts';
import { primitive } from '../src/library/primitive.ts';

export const objectPrimitives = [
  primitive({
    name: 'objects_by_colour',
    category: 'objects',
    parameters: ['Grid'],
    result: 'Objects',
    bits: 4,
    doc: 'Regions of one colour joined through edges, leaving out the background colour.',
    example: { input: [[1, 1, 0], [0, 0, 2], [0, 2, 2]], expression: 'count_objects(objects_by_colour(grid))', output: 2 },
    run: (g) => components(g, { diagonal: false, multicolour: false, background: backgroundColour(g) }),
  }),
];
