  local balances = {}
  local balance = 0
  for i, delta in ipairs(deltas) do
    balance = balance + delta
    balances[i] = balance
  end
  return balances
end
