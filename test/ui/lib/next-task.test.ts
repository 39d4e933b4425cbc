import { describe, expect, it } from 'vitest';
import { nextTask } from '../../../src/ui/lib/next-task.ts';

// The HTML event loop runs every queued microtask before the next task (HTML Living Standard,
// 8.1.7 event loops; from memory): work after nextTask must come after a long promise chain, in a task of its own.
describe('nextTask', () => {
  it('settles after every promise already queued, however long their chain', async () => {
    const order: string[] = [];
    const later = nextTask().then(() => order.push('task'));
    let chain = Promise.resolve();
    for (let i = 0; i < 100; i++) chain = chain.then(() => undefined);
    void chain.then(() => order.push('chain of 100'));
    await later;
    expect(order).toEqual(['chain of 100', 'task']);
  });

  it('lets a timer queued before it run first (it is a timer task, not a microtask)', async () => {
    const order: string[] = [];
    setTimeout(() => order.push('earlier timer'), 0);
    await nextTask();
    order.push('after nextTask');
    expect(order).toEqual(['earlier timer', 'after nextTask']);
  });
});
