groups = {}
for name in names:
    if name:
        groups.setdefault(name[0], []).append(name)
return groups
