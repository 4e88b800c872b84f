    var lengths = new Dictionary<string, long>();
    foreach (string word in words)
    {
        long count = 0;
        for (int i = 0; i < word.Length; i += char.IsSurrogatePair(word, i) ? 2 : 1)
        {
            count++;
        }
        lengths[word] = count;
    }
    return lengths;
}
