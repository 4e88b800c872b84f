"""Numbers from verdicts: unbiased pass@k in exact arithmetic and the run summary (``passk``),
bootstrap intervals, paired differences and McNemar's exact test (``stats``)."""

from .passk import exact_mean, parse_ks, pass_at_k, pass_at_k_exact, summarize

__all__ = ["exact_mean", "parse_ks", "pass_at_k", "pass_at_k_exact", "summarize"]
