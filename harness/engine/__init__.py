"""The engine: dumps in, verdicts out. Owns reading completion dumps (``completions``), turning
one sample into one verdict (``execution``), where verdicts are computed (``engines``: a local
thread pool, ``ray``: a cluster), ordering work (``scheduling``), sharing verdicts between
identical programs (``cache``), a whole scoring run (``scoring``), the data self-checks
(``checks``) and the demo scenario (``demo``). Import the module you need."""
