import {test} from 'vitest';
import {editDistance, didYouMean} from '../../src/config/suggest.js';
test('x', () => { console.log(editDistance('kidn','kind'), didYouMean('kidn', ['id','label','unit','source','column','kind'])); });
