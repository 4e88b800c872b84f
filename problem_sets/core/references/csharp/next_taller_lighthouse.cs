    var result = Enumerable.Repeat(-1L, heights.Count).ToList();
    // Indices still looking for a taller lighthouse, their heights non-increasing.
    var waiting = new Stack<int>();
    for (int i = 0; i < heights.Count; i++)
    {
        while (waiting.Count > 0 && heights[waiting.Peek()] < heights[i])
        {
            result[waiting.Pop()] = i;
        }
        waiting.Push(i);
    }
    return result;
}
