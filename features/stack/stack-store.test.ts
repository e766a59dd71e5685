import { addToStack, parseStack, removeFromStack, STACK_MAX } from './stack-store';

describe('stack list rules', () => {
  it('reads only valid distinct slugs, at most four', () => {
    expect(parseStack(JSON.stringify(['a-1', 'a-1', 'B bad', 3, 'b-2', 'c-3', 'd-4', 'e-5']))).toEqual(['a-1', 'b-2', 'c-3', 'd-4']);
    expect(parseStack('{not json')).toEqual([]);
    expect(parseStack(null)).toEqual([]);
  });

  it('adds until full and never twice', () => {
    let list: string[] = [];
    for (const s of ['a', 'b', 'c', 'd']) list = addToStack(list, s).list;
    expect(list).toHaveLength(STACK_MAX);
    expect(addToStack(list, 'e')).toEqual({ list, added: false });
    expect(addToStack(['a'], 'a')).toEqual({ list: ['a'], added: false });
    expect(removeFromStack(list, 'b')).toEqual(['a', 'c', 'd']);
  });
});
