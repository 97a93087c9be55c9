# Shared by .ci/check-tool-package and bench/start-to-exit (source it; it defines functions and sets no options).
# tool_rid: this machine's runtime identifier among those the tool is packed for, or nothing.
# install_tool WORK: packs the command-line tool for that runtime into WORK/nupkg, installs it from there into WORK/tool as a
# user would (`dotnet tool install --tool-path`), and sets $tool_package to the runtime's package and $padplan to the tool.
tool_rid() {
  case "$(uname -s)-$(uname -m)" in
    Linux-x86_64) echo linux-x64 ;;
    Linux-aarch64) echo linux-arm64 ;;
  esac
}

install_tool() {
  local work=$1 rid
  rid=$(tool_rid)
  dotnet pack src/PadPlan.Cli -c Release -o "$work/nupkg" -p:ToolPackageRuntimeIdentifiers="$rid" >/dev/null
  tool_package="$work/nupkg/PadPlan.Tool.$rid.0.1.0.nupkg"
  [ -f "$work/nupkg/PadPlan.Tool.0.1.0.nupkg" ] || { echo "pointer package PadPlan.Tool missing"; return 1; }
  dotnet tool install PadPlan.Tool --version 0.1.0 --tool-path "$work/tool" --add-source "$work/nupkg" >/dev/null
  padplan="$work/tool/padplan"
}
