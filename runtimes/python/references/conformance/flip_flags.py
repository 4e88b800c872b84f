return [not flag for flag in flags]
