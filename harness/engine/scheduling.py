"""Ordering jobs so the pool stays busy: interleave languages, start long compiles early.

Dumps usually arrive grouped (all Python, then all Rust); run in that order, a slow runtime
would hold every worker at once and its compiles would queue behind each other at the end.
Jobs are read into a bounded look-ahead window and handed out round-robin across groups,
groups with the higher priority (compiled languages) first in each round.
"""

from __future__ import annotations

from collections import OrderedDict, deque
from typing import Callable, Hashable, Iterable, Iterator, TypeVar

T = TypeVar("T")


def interleave(items: Iterable[T], group_of: Callable[[T], Hashable], priority_of: Callable[[Hashable], int],
               window: int = 1024) -> Iterator[T]:
    """Yield every item exactly once, round-robin across groups, reading at most ``window``
    items ahead. Within a group the input order is kept."""
    source = iter(items)
    queues: "OrderedDict[Hashable, deque]" = OrderedDict()
    buffered = 0
    exhausted = False
    while True:
        while not exhausted and buffered < window:
            item = next(source, _END)
            if item is _END:
                exhausted = True
                break
            queues.setdefault(group_of(item), deque()).append(item)
            buffered += 1
        if not buffered:
            return
        for group in sorted(queues, key=priority_of, reverse=True):
            queue = queues[group]
            if queue:
                buffered -= 1
                yield queue.popleft()
        for group in [g for g, q in queues.items() if not q]:
            del queues[group]


_END = object()
