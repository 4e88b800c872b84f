"""Ordering jobs so the pool stays busy: interleave languages, start the costly ones early.

Dumps usually arrive grouped (all Python, then all Rust); run in that order, a slow runtime
would hold every worker at once and its compiles would queue behind each other at the end.
Jobs are read into a bounded look-ahead window and handed out round-robin across groups,
the costlier groups first in each round. What a group costs is learnt as the run goes
(``CostModel``): with warm compilers a Java candidate costs a fraction of a Rust one, so a
fixed "compiled languages first" would put the wrong ones first; ending a run with the
cheap candidates keeps every worker busy until the last one.
"""

from __future__ import annotations

import threading
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


class CostModel:
    """Seconds one job of each group costs: ``prior(group)`` until the group's first jobs
    finish, then an exponential moving average of what they took (``observe``). Called with a
    group, it is a ``priority_of`` for ``interleave``: the costlier group first."""

    def __init__(self, prior: Callable[[Hashable], float], weight: float = 0.2):
        self.prior = prior
        self.weight = weight
        self.seconds: dict[Hashable, float] = {}
        self._lock = threading.Lock()

    def observe(self, group: Hashable, seconds: float) -> None:
        with self._lock:
            known = self.seconds.get(group)
            self.seconds[group] = seconds if known is None else known + self.weight * (seconds - known)

    def __call__(self, group: Hashable) -> float:
        found = self.seconds.get(group)
        return self.prior(group) if found is None else found
