return (len(entries), sum(marks))
