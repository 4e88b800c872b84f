# Array#rotate takes the count modulo the length and leaves an empty array empty.
crew.rotate(k)
end
