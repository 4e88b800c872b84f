"""Decisions from results folders: a run's report figures by language, difficulty and tag
(``report``), two checkpoints compared (``compare``), a series of checkpoints (``trend``).
Produces plain data; ``harness.render`` turns it into text, markdown, HTML or JSON."""
