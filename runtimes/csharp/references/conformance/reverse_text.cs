    var codePoints = new List<string>();
    for (int i = 0; i < text.Length; i += char.IsSurrogatePair(text, i) ? 2 : 1)
    {
        codePoints.Add(char.ConvertFromUtf32(char.ConvertToUtf32(text, i)));
    }
    codePoints.Reverse();
    return string.Concat(codePoints);
}
