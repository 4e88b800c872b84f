return {word: len(word) for word in words}
