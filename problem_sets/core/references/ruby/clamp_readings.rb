# A nil end makes the range open on that side.
values.map { |value| value.clamp(low..high) }
end
