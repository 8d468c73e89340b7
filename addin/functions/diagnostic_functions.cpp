// CALL_CHECK: every error cell's reason in words.
#include "../core/call_check.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::CALL_CHECK>() { return text_result<fn::CALL_CHECK>(explain_call); }

}  // namespace coilwright::sheet
