    var initials = new StringBuilder();
    foreach (string word in fullName.Split(' '))
    {
        if (word.Length == 0)
        {
            continue;
        }
        char first = word[0];
        if (first >= 'a' && first <= 'z')
        {
            initials.Append((char)(first - 'a' + 'A'));
        }
        else
        {
            // The whole first code point, both halves of a surrogate pair.
            initials.Append(word, 0, char.IsSurrogatePair(word, 0) ? 2 : 1);
        }
    }
    return initials.ToString();
}
