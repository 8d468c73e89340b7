// The menu command Coilwright > Save Frozen Copy for Sharing (URL org.coilwright.share:FrozenCopy),
// a protocol handler: it writes NAME-shared.ods and NAME-shared.pdf beside the open workbook
// (share_copy.hpp) and says what it did. tools/share_workbook.py dispatches the same command in
// a headless LibreOffice with the arguments TargetURL (where the .ods goes) and Silent (no
// message box); the dispatch result lists what was written and frozen.
#include <com/sun/star/awt/MessageBoxButtons.hpp>
#include <com/sun/star/awt/Toolkit.hpp>
#include <com/sun/star/awt/XMessageBox.hpp>
#include <com/sun/star/awt/XMessageBoxFactory.hpp>
#include <com/sun/star/awt/XWindow2.hpp>
#include <com/sun/star/awt/XWindowPeer.hpp>
#include <com/sun/star/frame/DispatchResultEvent.hpp>
#include <com/sun/star/frame/DispatchResultState.hpp>
#include <com/sun/star/frame/FeatureStateEvent.hpp>
#include <com/sun/star/frame/XController.hpp>
#include <com/sun/star/frame/XDispatchProvider.hpp>
#include <com/sun/star/frame/XFrame.hpp>
#include <com/sun/star/frame/XNotifyingDispatch.hpp>
#include <com/sun/star/frame/XStatusListener.hpp>
#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/lang/XInitialization.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <com/sun/star/util/URL.hpp>
#include <cppuhelper/implbase4.hxx>
#include <cppuhelper/supportsservice.hxx>
#include <rtl/uri.hxx>

#include "share_copy.hpp"
#include "share_support.hpp"

using rtl::OUString;

namespace coilwright::share {

namespace {

constexpr char kProtocol[] = "org.coilwright.share:";
constexpr char kImplementation[] = "org.coilwright.ShareCommand";

// "file:///a/my%20design-shared.ods" -> "/a/my design-shared.ods", for people to read.
std::string readable(const OUString& url) {
    OUString path = rtl::Uri::decode(url, rtl_UriDecodeWithCharset, RTL_TEXTENCODING_UTF8);
    if (path.startsWith("file://")) path = path.copy(7);
    return utf8(path);
}

std::string summary(const ShareOutcome& o) {
    const std::string ods = readable(o.copy_url), pdf = readable(o.pdf_url);
    const std::size_t slash = ods.rfind('/');
    std::string text = "Wrote " + ods.substr(slash + 1) + " and " + pdf.substr(pdf.rfind('/') + 1) + " in " +
                       ods.substr(0, slash) + ".\n\nFrozen: " + std::to_string(o.cells) + " cells (" +
                       std::to_string(o.arrays) + " array formulas, " + std::to_string(o.errors) + " error cells), " +
                       std::to_string(o.names) + " named expressions, " + std::to_string(o.conditional_formats) +
                       " conditional formats, " + std::to_string(o.validations) + " validity rules.";
    for (const auto& w : o.warnings) text += "\n" + w;
    return text;
}

class ShareCommand : public cppu::WeakImplHelper4<css::frame::XDispatchProvider, css::frame::XNotifyingDispatch,
                                                  css::lang::XInitialization, css::lang::XServiceInfo> {
public:
    explicit ShareCommand(const Reference<css::uno::XComponentContext>& context) : context_(context) {}

    // XInitialization: the frame whose document the command works on.
    void SAL_CALL initialize(const Sequence<Any>& arguments) override {
        for (const Any& a : arguments) {
            Reference<css::frame::XFrame> frame;
            if (a >>= frame) frame_ = frame;
        }
    }

    // XDispatchProvider
    Reference<css::frame::XDispatch> SAL_CALL queryDispatch(const css::util::URL& url, const OUString&, sal_Int32) override {
        if (url.Complete.startsWith(kProtocol)) return this;
        return {};
    }
    Sequence<Reference<css::frame::XDispatch>> SAL_CALL
    queryDispatches(const Sequence<css::frame::DispatchDescriptor>& requests) override {
        Sequence<Reference<css::frame::XDispatch>> out(requests.getLength());
        for (sal_Int32 i = 0; i < requests.getLength(); ++i)
            out.getArray()[i] = queryDispatch(requests[i].FeatureURL, requests[i].FrameName, requests[i].SearchFlags);
        return out;
    }

    // XDispatch, XNotifyingDispatch
    void SAL_CALL dispatch(const css::util::URL& url, const Sequence<css::beans::PropertyValue>& args) override {
        dispatchWithNotification(url, args, {});
    }
    void SAL_CALL dispatchWithNotification(const css::util::URL&, const Sequence<css::beans::PropertyValue>& args,
                                           const Reference<css::frame::XDispatchResultListener>& listener) override {
        OUString target;
        bool silent = false;
        for (const auto& a : args) {
            if (a.Name == "TargetURL") a.Value >>= target;
            if (a.Name == "Silent") a.Value >>= silent;
        }
        std::vector<css::beans::PropertyValue> result;
        bool ok = false;
        std::string message;
        try {
            if (!frame_.is() || !frame_->getController().is()) throw css::uno::RuntimeException("No document is open.");
            const auto document = frame_->getController()->getModel();
            if (target.isEmpty()) target = default_copy_url(document.is() ? document->getURL() : OUString());
            if (target.isEmpty())
                throw css::uno::RuntimeException("Save the workbook first: the frozen copy is written beside it.");
            const ShareOutcome o = write_frozen_copy(context_, document, target);
            ok = true;
            message = summary(o);
            Sequence<OUString> warnings(static_cast<sal_Int32>(o.warnings.size()));
            for (std::size_t i = 0; i < o.warnings.size(); ++i) warnings.getArray()[i] = ustr(o.warnings[i]);
            result = {property("Copy", Any(o.copy_url)), property("Pdf", Any(o.pdf_url)),
                      property("FrozenCells", Any(o.cells)), property("FrozenArrays", Any(o.arrays)),
                      property("ErrorCells", Any(o.errors)), property("FrozenNames", Any(o.names)),
                      property("FrozenConditionalFormats", Any(o.conditional_formats)),
                      property("FrozenValidations", Any(o.validations)),
                      property("ExactValues", Any(static_cast<sal_Int32>(o.exact_values))),
                      property("Warnings", Any(warnings))};
        } catch (const css::uno::Exception& e) {
            message = "No frozen copy was written: " + utf8(e.Message);
        } catch (const std::exception& e) {
            message = std::string("No frozen copy was written: ") + e.what();
        }
        result.push_back(property("Success", Any(ok)));
        result.push_back(property("Message", Any(ustr(message))));
        if (!silent) show(ok, message);
        if (listener.is()) {
            css::frame::DispatchResultEvent event;
            event.Source = static_cast<cppu::OWeakObject*>(this);
            event.State = ok ? css::frame::DispatchResultState::SUCCESS : css::frame::DispatchResultState::FAILURE;
            event.Result <<= Sequence<css::beans::PropertyValue>(result.data(), static_cast<sal_Int32>(result.size()));
            listener->dispatchFinished(event);
        }
    }
    void SAL_CALL addStatusListener(const Reference<css::frame::XStatusListener>& listener,
                                    const css::util::URL& url) override {
        if (!listener.is()) return;
        css::frame::FeatureStateEvent state;
        state.Source = static_cast<cppu::OWeakObject*>(this);
        state.FeatureURL = url;
        state.IsEnabled = true;
        listener->statusChanged(state);
    }
    void SAL_CALL removeStatusListener(const Reference<css::frame::XStatusListener>&, const css::util::URL&) override {}

    // XServiceInfo
    OUString SAL_CALL getImplementationName() override { return OUString::createFromAscii(kImplementation); }
    sal_Bool SAL_CALL supportsService(const OUString& name) override { return cppu::supportsService(this, name); }
    Sequence<OUString> SAL_CALL getSupportedServiceNames() override {
        Sequence<OUString> names(1);
        names.getArray()[0] = "com.sun.star.frame.ProtocolHandler";
        return names;
    }

private:
    // A message box over the document's window; none when it is hidden (headless, scripted use).
    void show(bool ok, const std::string& message) {
        try {
            if (!frame_.is()) return;
            Reference<css::awt::XWindow2> window(frame_->getContainerWindow(), UNO_QUERY);
            if (!window.is() || !window->isVisible()) return;
            Reference<css::awt::XMessageBoxFactory> boxes(css::awt::Toolkit::create(context_), UNO_QUERY_THROW);
            auto box = boxes->createMessageBox(Reference<css::awt::XWindowPeer>(window, UNO_QUERY),
                                               ok ? css::awt::MessageBoxType_INFOBOX : css::awt::MessageBoxType_ERRORBOX,
                                               css::awt::MessageBoxButtons::BUTTONS_OK, "Coilwright", ustr(message));
            box->execute();
            Reference<css::lang::XComponent>(box, UNO_QUERY_THROW)->dispose();
        } catch (const css::uno::Exception&) {
        }
    }

    Reference<css::uno::XComponentContext> context_;
    Reference<css::frame::XFrame> frame_;
};

}  // namespace

}  // namespace coilwright::share

// Constructor named in the .components file.
extern "C" SAL_DLLPUBLIC_EXPORT css::uno::XInterface* org_coilwright_ShareCommand_get_implementation(
    css::uno::XComponentContext* context, const css::uno::Sequence<css::uno::Any>&) {
    auto* command = new coilwright::share::ShareCommand(context);
    command->acquire();
    return static_cast<cppu::OWeakObject*>(command);
}
