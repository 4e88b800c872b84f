"""What people and scripts read: terminal tables and colour (``text``), the progress line
(``progress``), the summary table (``summary``), and the report formats, one module each,
registered by name in ``formats``."""
