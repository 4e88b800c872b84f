return end - from_ if type in in_ else default
