import { act, renderHook } from '@testing-library/react-native';
import { STACK_KEY, useStackSelection } from './index';

beforeEach(() => window.localStorage.clear());

describe('useStackSelection', () => {
  it('persists to localStorage and reports a full stack at four', () => {
    const { result } = renderHook(() => useStackSelection());
    act(() => {
      for (const s of ['a-1', 'b-2', 'c-3', 'd-4']) result.current.add(s);
    });
    expect(result.current.count).toBe(4);
    expect(result.current.full).toBe(true);
    expect(JSON.parse(window.localStorage.getItem(STACK_KEY) ?? '[]')).toEqual(['a-1', 'b-2', 'c-3', 'd-4']);
    let added = true;
    act(() => {
      added = result.current.add('e-5');
    });
    expect(added).toBe(false);
    act(() => result.current.remove('b-2'));
    expect(result.current.has('b-2')).toBe(false);
    expect(result.current.list).toEqual(['a-1', 'c-3', 'd-4']);
  });

  it('shares one selection between components', () => {
    const a = renderHook(() => useStackSelection());
    const b = renderHook(() => useStackSelection());
    act(() => {
      a.result.current.add('x-1');
    });
    expect(b.result.current.has('x-1')).toBe(true);
  });
});
