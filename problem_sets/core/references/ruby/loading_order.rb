# Kahn's algorithm, always loading the smallest ready item. String comparison is by UTF-8
# bytes, which orders names by code point.
needs = Hash.new { |hash, item| hash[item] = Set.new }
users = Hash.new { |hash, item| hash[item] = Set.new }
deps.each do |item, before|
  needs[item]
  users[item]
  before.each do |other|
    needs[other]
    users[other]
    needs[item] << other
    users[other] << item
  end
end
waiting = needs.transform_values(&:size)
ready = waiting.select { |_, count| count.zero? }.keys
order = []
until ready.empty?
  item = ready.min
  ready.delete(item)
  order << item
  users[item].each do |user|
    waiting[user] -= 1
    ready << user if waiting[user].zero?
  end
end
order.size == needs.size ? order : nil
end
