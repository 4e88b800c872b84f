return text[::-1]
