"""Which (problem, language, sample) keys a run has seen, in about one bit per sample."""

from __future__ import annotations


class SampleKeySet:
    """A set of (problem, language, sample) keys at about one bit per sample, so it stays small
    for dumps of millions of rows: a bitmap per (problem, language) pair for sample indices
    below 2**24, a plain set for the rare larger ones."""

    BITMAP_LIMIT = 1 << 24

    def __init__(self) -> None:
        self._bits: dict[tuple[str, str], bytearray] = {}
        self._large: set[tuple[str, str, int]] = set()

    def add(self, key: tuple[str, str, int]) -> None:
        problem, language, index = key
        if index >= self.BITMAP_LIMIT:
            self._large.add(key)
            return
        bitmap = self._bits.setdefault((problem, language), bytearray())
        byte = index >> 3
        if byte >= len(bitmap):
            bitmap.extend(bytes(max(byte + 1 - len(bitmap), len(bitmap))))  # grow by doubling
        bitmap[byte] |= 1 << (index & 7)

    def __contains__(self, key: tuple[str, str, int]) -> bool:
        problem, language, index = key
        if index >= self.BITMAP_LIMIT:
            return key in self._large
        bitmap = self._bits.get((problem, language))
        byte = index >> 3
        return bitmap is not None and byte < len(bitmap) and bool(bitmap[byte] & (1 << (index & 7)))
