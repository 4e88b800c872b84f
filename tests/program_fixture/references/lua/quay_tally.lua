local numbers = {}
for token in io.read("a"):gmatch("%S+") do
  numbers[#numbers + 1] = math.tointeger(tonumber(token))
end
local total, heaviest = 0, 0
for i = 2, numbers[1] + 1 do
  total = total + numbers[i]
  if numbers[i] > heaviest then heaviest = numbers[i] end
end
print(total .. " " .. heaviest)
