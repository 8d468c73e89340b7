// The UNO component Calc instantiates: the interface generated from idl/functions/*.toml plus
// XServiceName and XServiceInfo. Every method forwards to dispatch(), which converts the
// arguments, runs the UNO-free evaluation and returns a failure as Calc's own error value (a
// NaN carrying the error number: Err:502, Err:523, #VALUE!), which Calc shows exactly as it
// shows the exceptions an add-in may throw (IllegalArgumentException: Err:502,
// NoConvergenceException: Err:523). No exception leaves the add-in: the library carries its own
// C++ runtime (addin/CMakeLists.txt), and an exception thrown by one runtime and caught by
// another leaves both miscounting the exceptions in flight.
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <cppuhelper/implbase3.hxx>
#include <cppuhelper/supportsservice.hxx>
#include <org/coilwright/XFunctions.hpp>
#include <uno/lbnames.h>
#include <uno/mapping.hxx>

#include <exception>
#include <stdexcept>

#include "../core/evaluate.hpp"
#include "../core/fixed_vector.hpp"
#include "any_conversion.hpp"
#include "../core/catalogue.hpp"

using rtl::OUString;
namespace uno = css::uno;

namespace coilwright::uno_glue {

namespace {

class FunctionsComponent
    : public cppu::WeakImplHelper3<org::coilwright::XFunctions, css::lang::XServiceName, css::lang::XServiceInfo> {
public:
    // XServiceName: the name Calc writes into saved formulas.
    OUString SAL_CALL getServiceName() override { return OUString::createFromAscii(sheet::addin_service_name()); }

    // XServiceInfo
    OUString SAL_CALL getImplementationName() override { return OUString::createFromAscii(sheet::addin_service_name()); }
    sal_Bool SAL_CALL supportsService(const OUString& name) override { return cppu::supportsService(this, name); }
    uno::Sequence<OUString> SAL_CALL getSupportedServiceNames() override {
        uno::Sequence<OUString> names(2);
        names.getArray()[0] = OUString::createFromAscii(sheet::addin_service_name());
        names.getArray()[1] = "com.sun.star.sheet.AddIn";
        return names;
    }

#include "addin_methods.inc"

    // Calc calls every add-in function through core reflection, which maps this object into the
    // binary UNO environment for each call. With no mapped proxy alive, each call builds one,
    // registers it and tears it down again: a third of a scalar cell's cost (bench/
    // calc_callgrind.py). One proxy held for the object's lifetime turns that into a registry
    // lookup. The proxy holds the object in turn, which changes nothing: Calc keeps its add-in
    // objects until LibreOffice exits.
    void keep_mapped_proxy() {
        const uno::Mapping to_uno(CPPU_CURRENT_LANGUAGE_BINDING_NAME, UNO_LB_UNO);
        if (to_uno.is())
            mapped_proxy_ = to_uno.mapInterface(static_cast<org::coilwright::XFunctions*>(this),
                                                cppu::UnoType<org::coilwright::XFunctions>::get());
    }

private:
    void* mapped_proxy_ = nullptr;  // uno_Interface*, deliberately never released (see above)

    uno::Any dispatch(std::size_t index, const uno::Any* const* args, std::size_t count) {
        // Most cells pass plain numbers and succeed: answer them without building the call.
        double numbers[sheet::kMaxArgs];
        std::uint32_t omitted = 0;
        double value = 0.0;
        if (count <= sheet::kMaxArgs && plain_numbers(args, count, numbers, omitted) &&
            sheet::evaluate_plain(index, {numbers, count}, omitted, value))
            return uno::Any(value);

        sheet::CallResult result;
        try {
            const sheet::FunctionSpec& spec = sheet::function_specs()[index];
            sheet::FixedVector<sheet::Arg, sheet::kMaxArgs> converted;  // no function has more (checked by a test)
            for (std::size_t i = 0; i < count; ++i)
                converted.push_back(to_arg(*args[i], spec.args[i]));  // throws beyond kMaxArgs or a range's limits
            result = sheet::evaluate(index, {converted.data(), count});
        } catch (const std::invalid_argument& e) {  // DomainError: a range refused before it was read
            result = sheet::CallResult::failure(sheet::CellError::IllegalArgument, e.what());
        } catch (const std::exception& e) {
            // Nothing may escape into Calc but the exceptions it understands.
            result = sheet::CallResult::failure(sheet::CellError::NoValue, e.what());
        } catch (const uno::Exception& e) {  // Calc's range object failed while being read
            result = sheet::CallResult::failure(sheet::CellError::NoValue,
                                                rtl::OUStringToOString(e.Message, RTL_TEXTENCODING_UTF8).getStr());
        } catch (...) {
            result = sheet::CallResult::failure(sheet::CellError::NoValue, "unexpected failure");
        }
        if (result.error == sheet::CellError::None) return to_any(result);
        return uno::Any(calc_error_value(result.error));  // the whole cell (or array formula) an error
    }
};

}  // namespace

}  // namespace coilwright::uno_glue

// Constructor named in the .components file.
extern "C" SAL_DLLPUBLIC_EXPORT uno::XInterface* org_coilwright_Functions_get_implementation(
    uno::XComponentContext*, const uno::Sequence<uno::Any>&) {
    auto* component = new coilwright::uno_glue::FunctionsComponent();
    component->acquire();
    component->keep_mapped_proxy();
    return static_cast<cppu::OWeakObject*>(component);
}
