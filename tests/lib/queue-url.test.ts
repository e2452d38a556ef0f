// The queue's filters, sort and search live in the page's address, so a reload or a shared link
// opens the same queue (issue 15). Defaults stay out of the address; anything not understood is
// dropped for the default, never an error.
import { describe, expect, it } from 'vitest';
import { DEFAULT_QUEUE_FILTER } from '@/lib/shared/queue-filter';
import { DEFAULT_QUEUE_SORT, queueUrlSearch, readQueueUrl } from '@/lib/shared/queue-url';

const WHO = ['all', 'mine-open', 'mine', 'nobody', 'user-b'];

describe('the queue address', () => {
  it('is bare for the default queue', () => {
    expect(queueUrlSearch(DEFAULT_QUEUE_FILTER, DEFAULT_QUEUE_SORT)).toBe('');
    expect(readQueueUrl('', WHO)).toEqual({ filter: DEFAULT_QUEUE_FILTER, sort: DEFAULT_QUEUE_SORT });
  });

  it('reads back what it wrote: filters, search and sort', () => {
    const filter = { step: 'cut' as const, who: 'user-b', due: 'overdue' as const, search: 'PH 1003 & co' };
    const sort = [{ id: 'ticketNumber', desc: true }];
    const search = queueUrlSearch(filter, sort);
    expect(search).toBe('?step=cut&who=user-b&due=overdue&search=PH+1003+%26+co&sort=-ticketNumber');
    expect(readQueueUrl(search, WHO)).toEqual({ filter, sort });
  });

  it('drops what it does not know for the default: a step, a due, a sort column, a person not offered', () => {
    const read = readQueueUrl('?step=burnt&due=soon&who=someone-else&sort=price,-due', WHO);
    expect(read.filter).toEqual(DEFAULT_QUEUE_FILTER);
    expect(read.sort).toEqual([{ id: 'due', desc: true }]);
    expect(readQueueUrl('?sort=nothing', WHO).sort).toEqual(DEFAULT_QUEUE_SORT);
  });
});
