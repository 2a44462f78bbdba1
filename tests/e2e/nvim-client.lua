-- End-to-end test of `windscript lsp` with Neovim's built-in LSP client (an independent
-- implementation), headless. Run by run.sh as:
--   WINDSCRIPT_CMD="<server command>" E2E_FILE=<broken .wind> E2E_RESULT=<out file> \
--     nvim --headless --clean -u NONE -c "luafile nvim-client.lua"
-- The file must contain a "bore N" line without its unit (an error the server reports as WS2010).
local result_path = assert(os.getenv("E2E_RESULT"), "E2E_RESULT not set")
local file = assert(os.getenv("E2E_FILE"), "E2E_FILE not set")
local cmd = {}
for word in string.gmatch(assert(os.getenv("WINDSCRIPT_CMD"), "WINDSCRIPT_CMD not set"), "%S+") do table.insert(cmd, word) end
table.insert(cmd, "lsp")

local lines, passed, failed = {}, 0, 0
local function check(name, ok, detail)
  if ok then
    passed = passed + 1
    table.insert(lines, "  ok    " .. name)
  else
    failed = failed + 1
    table.insert(lines, "  FAIL  " .. name .. (detail and (": " .. detail) or ""))
  end
end
local function finish()
  table.insert(lines, string.format("neovim client: %d passed, %d failed", passed, failed))
  local out = io.open(result_path, "w")
  out:write(table.concat(lines, "\n") .. "\n")
  out:close()
  vim.cmd(failed == 0 and "qall!" or "cquit!")
end

local ok, err = pcall(function()
  vim.cmd("edit " .. vim.fn.fnameescape(file))
  local bufnr = vim.api.nvim_get_current_buf()
  local exit_code
  local client_id = vim.lsp.start_client({
    name = "windscript",
    cmd = cmd,
    root_dir = vim.fn.fnamemodify(file, ":p:h"),
    on_exit = function(code) exit_code = code end,
  })
  check("start_client launched the server", client_id ~= nil)
  vim.lsp.buf_attach_client(bufnr, client_id)

  -- 1. The error in the file arrives as a diagnostic with its code and exact place.
  local got = vim.wait(20000, function() return #vim.diagnostic.get(bufnr) > 0 end, 50)
  check("diagnostics arrive after opening the file", got)
  local bore_line
  for i, text in ipairs(vim.api.nvim_buf_get_lines(bufnr, 0, -1, false)) do
    if text:find("^%s*bore%s+[%d%.]+%s*$") then bore_line = i - 1 end
  end
  local found
  for _, d in ipairs(vim.diagnostic.get(bufnr)) do
    local code = d.code or (d.user_data and d.user_data.lsp and d.user_data.lsp.code)
    if code == "WS2010" then found = d end
  end
  check("the missing unit is reported as WS2010", found ~= nil, vim.inspect(vim.diagnostic.get(bufnr)))
  local bore_text = vim.api.nvim_buf_get_lines(bufnr, bore_line, bore_line + 1, false)[1]
  local number_start, number_end = bore_text:find("[%d%.]+")
  if found then
    local col, end_col = number_start - 1, number_end
    check("WS2010 points at the bore's number (line and columns)", found.lnum == bore_line and found.col == col and found.end_col == end_col,
      string.format("lnum %d col %d end_col %d, expected %d %d %d", found.lnum, found.col, found.end_col, bore_line, col, end_col))
  end

  -- 2. Typing the unit (an incremental change from Neovim) clears the diagnostic.
  vim.api.nvim_buf_set_text(bufnr, bore_line, number_end, bore_line, number_end, { " mm" })
  local cleared = vim.wait(20000, function()
    for _, d in ipairs(vim.diagnostic.get(bufnr)) do
      if (d.code or (d.user_data and d.user_data.lsp and d.user_data.lsp.code)) == "WS2010" then return false end
    end
    return true
  end, 50)
  check("after typing ' mm' the diagnostic is withdrawn", cleared)

  -- 3. Hover on the winding shows evaluated physics.
  local winding_line
  for i, t in ipairs(vim.api.nvim_buf_get_lines(bufnr, 0, -1, false)) do
    if t:find("^winding ") then winding_line = i - 1 end
  end
  local hover = vim.lsp.buf_request_sync(bufnr, "textDocument/hover",
    { textDocument = { uri = vim.uri_from_bufnr(bufnr) }, position = { line = winding_line, character = 9 } }, 10000)
  local value = hover and hover[client_id] and hover[client_id].result and hover[client_id].result.contents.value or ""
  check("hover on the winding shows its fundamental winding factor", value:find("kw1 = 0.", 1, true) ~= nil, value)

  -- 4. Formatting answers with edits (none: the file is canonical once fixed).
  local formatting = vim.lsp.buf_request_sync(bufnr, "textDocument/formatting",
    { textDocument = { uri = vim.uri_from_bufnr(bufnr) }, options = { tabSize = 2, insertSpaces = true } }, 10000)
  local edits = formatting and formatting[client_id] and formatting[client_id].result
  check("formatting answers with a list of edits", type(edits) == "table", vim.inspect(formatting))

  -- 5. Stopping the client runs shutdown and exit: the server exits with code 0.
  vim.lsp.stop_client(client_id)
  local stopped = vim.wait(10000, function() return exit_code ~= nil end, 50)
  check("shutdown/exit: the server exits with code 0", stopped and exit_code == 0, tostring(exit_code))
end)
if not ok then check("the Neovim script ran to the end", false, tostring(err)) end
finish()
